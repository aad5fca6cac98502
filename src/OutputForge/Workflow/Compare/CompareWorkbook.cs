using OutputForge.Rendering.Excel;

namespace OutputForge.Workflow.Compare;

/// <summary>The compare report as a workbook: Summary, Mismatches, Only in QC, Only in production and Matched sheets.</summary>
internal static class CompareWorkbook
{
    private static readonly string[] NumberHeader =
        ["QC line", "table", "row", "column", "statistic", "row label", "column label", "production shown", "production value", "QC value", "reason"];

    public static void Save(CompareResult result, string path)
    {
        var sheets = new List<ReportSheet>();
        void Sheet(string name, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows) => sheets.Add(new ReportSheet(name, header, rows.ToList()));
        Sheet("Summary", ["item", "value"],
        [
            ["result", result.Passed ? "PASSED" : "FAILED"],
            ["production", result.ProductionFile],
            ["QC file", result.QcFile],
            ["rule", $"counts (n, N) exactly; other statistics {result.Tolerance}"],
            ["matched", result.Matched.ToString(System.Globalization.CultureInfo.InvariantCulture)],
            ["mismatched", result.Mismatched.ToString(System.Globalization.CultureInfo.InvariantCulture)],
            ["only in production", result.OnlyInProduction.Count.ToString(System.Globalization.CultureInfo.InvariantCulture)],
            ["only in production counts", result.OnlyInProductionScope],
            ["only in QC", result.OnlyInQc.ToString(System.Globalization.CultureInfo.InvariantCulture)],
        ]);
        Sheet("Mismatches", NumberHeader, Rows(result, QcOutcome.Mismatched));
        Sheet("Only in QC", ["QC line", "table", "row", "column", "statistic", "QC value", "reason"],
            result.Checks.Where(c => c.Outcome == QcOutcome.OnlyInQc).Select(c => (IReadOnlyList<string>)
                [Line(c), c.Line.Table, c.Line.Row, c.Line.Column, c.Line.Statistic, c.Line.Value, c.Reason ?? string.Empty]));
        Sheet("Only in production", ["table", "row", "column", "statistic", "row label", "column label", "shown", "value"],
            result.OnlyInProduction.Select(r => (IReadOnlyList<string>)
                [r.Table, r.Row, r.Column, r.Statistic, r.RowLabel, r.ColumnLabel, r.Formatted, CompareTextReport.Raw(r.Value)]));
        Sheet("Matched", NumberHeader, Rows(result, QcOutcome.Matched));
        ReportWorkbookWriter.Save(sheets, path);
    }

    private static string Line(QcCheck check) => check.Line.Line.ToString(System.Globalization.CultureInfo.InvariantCulture);

    private static IEnumerable<IReadOnlyList<string>> Rows(CompareResult result, QcOutcome outcome) =>
        result.Checks.Where(c => c.Outcome == outcome).Select(c => (IReadOnlyList<string>)
        [
            Line(c), c.Production!.Table, c.Production.Row, c.Production.Column, c.Production.Statistic,
            c.Production.RowLabel, c.Production.ColumnLabel, c.Production.Formatted, CompareTextReport.Raw(c.Production.Value),
            c.Line.Value, c.Reason ?? string.Empty,
        ]);
}
