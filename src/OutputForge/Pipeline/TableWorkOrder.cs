using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// The order in which the cores take up the tables: the slowest kinds first (longest processing time first), so
/// that the run does not end with one core building a large table while the other waits. Only the order of work
/// changes: every table is still analysed on its own and the outputs stay in package order. The weights are the
/// kinds' relative costs on the pooled study (docs/performance.md, per-table timings of `run --verbose`).
/// </summary>
internal static class TableWorkOrder
{
    public static int[] Of(IReadOnlyList<TableSpec> tables) =>
        Enumerable.Range(0, tables.Count).OrderByDescending(i => Weight(tables[i])).ThenBy(i => i).ToArray();

    private static int Weight(TableSpec table) => table.Kind switch
    {
        "subgroups" => 20,
        // One model (and its descriptive rows) per visit.
        "continuous" => 4 * Math.Max(1, table.Continuous?.Visits.Count ?? 1),
        "demographics" => 10,
        "adverse-events" or "time-to-event" or "categorical-by-visit" or "disposition" => 5,
        "responders" => 2,
        _ => 1,
    };
}
