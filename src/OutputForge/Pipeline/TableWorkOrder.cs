using OutputForge.Layout;
using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// The order in which the cores take up the tables: table-number order, so that the combined workbook, written sheet
/// by sheet in that order beside the tables (<see cref="CombinedWorkbookBuilder"/>), can take each table soon after
/// it is ready; except that the tables of a kind that runs first (<see cref="Kinds.ITableKind.RunsFirst"/>: the
/// subgroup tables, several times slower than any other with a logistic regression per subgroup, docs/performance.md)
/// go first, so that the run does not end with one core on them while the other waits. Only the order of work changes: every table is analysed on its own and the outputs stay in package order.
/// </summary>
internal static class TableWorkOrder
{
    public static int[] Of(IReadOnlyList<TableSpec> tables) =>
        Enumerable.Range(0, tables.Count)
            .OrderBy(i => Kinds.TableKinds.Find(tables[i].Kind) is { RunsFirst: true } ? 0 : 1)
            .ThenBy(i => tables[i].Id, TableIdOrder.Instance)
            .ThenBy(i => i)
            .ToArray();
}
