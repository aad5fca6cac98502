using OutputForge.Rendering.Excel;

namespace OutputForge.Workflow.Changes;

/// <summary>The changes report as a workbook: Summary (inputs and tables), Numbers (every changed number, old and new), Rows and columns (appeared or disappeared).</summary>
internal static class ChangesWorkbook
{
    public static void Save(RunChanges changes, string path)
    {
        var sheets = new List<ReportSheet>();
        void Sheet(string name, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows) => sheets.Add(new ReportSheet(name, header, rows.ToList()));
        var summary = new List<IReadOnlyList<string>>
        {
            new[] { "run", "before", changes.Before, changes.BeforeRunTime },
            new[] { "run", "after", changes.After, changes.AfterRunTime },
        };
        summary.AddRange(changes.Inputs.Select(i => (IReadOnlyList<string>)[i.Kind, i.Name, i.Status.ToString().ToLowerInvariant(), ChangesTextReport.Describe(i)]));
        summary.AddRange(changes.Tables.Select(t => (IReadOnlyList<string>)["table", t.Id, t.Status.ToString().ToLowerInvariant(), ChangesTextReport.Describe(t)]));
        Sheet("Summary", ["item", "name", "status", "detail"], summary);
        Sheet("Numbers",
            ["table", "row", "column", "statistic", "row label", "column label", "before", "after", "before value", "after value"],
            changes.Tables.SelectMany(t => t.Numbers.Select(n => (IReadOnlyList<string>)
            [
                n.Before.Table, n.Before.Row, n.Before.Column, n.Before.Statistic, n.After.RowLabel, n.After.ColumnLabel,
                n.Before.Formatted, n.After.Formatted, Compare.CompareTextReport.Raw(n.Before.Value), Compare.CompareTextReport.Raw(n.After.Value),
            ]))
            .Concat(changes.Tables.SelectMany(t => t.NumbersAdded.Select(r => (IReadOnlyList<string>)
                [r.Table, r.Row, r.Column, r.Statistic, r.RowLabel, r.ColumnLabel, "(none)", r.Formatted, "", Compare.CompareTextReport.Raw(r.Value)])))
            .Concat(changes.Tables.SelectMany(t => t.NumbersRemoved.Select(r => (IReadOnlyList<string>)
                [r.Table, r.Row, r.Column, r.Statistic, r.RowLabel, r.ColumnLabel, r.Formatted, "(none)", Compare.CompareTextReport.Raw(r.Value), ""]))));
        Sheet("Rows and columns", ["table", "what", "key"],
            changes.Tables.SelectMany(t =>
                t.RowsAdded.Select(k => (IReadOnlyList<string>)[t.Id, "row added", k])
                    .Concat(t.RowsRemoved.Select(k => (IReadOnlyList<string>)[t.Id, "row removed", k]))
                    .Concat(t.ColumnsAdded.Select(k => (IReadOnlyList<string>)[t.Id, "column added", k]))
                    .Concat(t.ColumnsRemoved.Select(k => (IReadOnlyList<string>)[t.Id, "column removed", k]))));
        ReportWorkbookWriter.Save(sheets, path);
    }
}
