using OutputForge.Results;

namespace OutputForge.Analysis.Summaries;

/// <summary>Heading and spacer rows shared by the summary kinds.</summary>
public static class SummaryRows
{
    public static ResultRow Heading(string key, string label, IEnumerable<string> columnKeys, IReadOnlyList<ResultCell>? cells = null)
    {
        var byColumn = (cells ?? []).ToDictionary(c => c.Column, StringComparer.Ordinal);
        return new ResultRow(key, label, 0,
            columnKeys.Select(k => byColumn.GetValueOrDefault(k) ?? CellFactory.Empty(k)).ToList(), ResultRowKind.Section);
    }

    public static ResultRow Blank(string key, IEnumerable<string> columnKeys) =>
        new(key, string.Empty, 0, columnKeys.Select(CellFactory.Empty).ToList(), ResultRowKind.Blank);

    /// <summary>Warnings for every "NE" in the rows, naming the row and column.</summary>
    public static IEnumerable<string> NotEstimableWarnings(IEnumerable<ResultRow> rows) =>
        rows.SelectMany(r => r.Cells.SelectMany(c => c.Values
                .Where(v => v.NotEstimableReason is not null)
                .Select(v => $"NE (not estimable) in \"{r.Label}\", column {c.Column}: {v.NotEstimableReason}.")))
            .Distinct();
}
