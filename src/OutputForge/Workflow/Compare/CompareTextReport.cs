using System.Globalization;

namespace OutputForge.Workflow.Compare;

/// <summary>The plain-text compare report: the summary, every mismatch with both values, every QC line not found, and the production numbers no QC line named, counted per table.</summary>
public static class CompareTextReport
{
    public static void Write(TextWriter output, CompareResult result)
    {
        output.WriteLine($"OutputForge compare: {(result.Passed ? "PASSED" : "FAILED")}");
        output.WriteLine($"production: {result.ProductionFile}");
        output.WriteLine($"QC:         {result.QcFile}");
        output.WriteLine($"rule:       counts (n, N) exactly; other statistics {result.Tolerance}");
        output.WriteLine(result.Summary);
        Section(output, "Mismatches", result.Checks.Where(c => c.Outcome == QcOutcome.Mismatched).Select(c =>
            $"line {c.Line.Line}: {c.Production!.Address} ({c.Production.RowLabel} / {c.Production.ColumnLabel}): production {c.Production.Formatted} ({Raw(c.Production.Value)}), QC {c.Line.Value}: {c.Reason}"));
        Section(output, "Only in QC", result.Checks.Where(c => c.Outcome == QcOutcome.OnlyInQc).Select(c =>
            $"line {c.Line.Line}: {c.Line.Address} = {c.Line.Value}: {c.Reason}"));
        Section(output, "Only in production (numbers per table)", result.OnlyInProduction
            .GroupBy(r => r.Table, StringComparer.Ordinal)
            .Select(g => $"{g.Key}: {g.Count()}"));
    }

    private static void Section(TextWriter output, string title, IEnumerable<string> lines)
    {
        var list = lines.ToList();
        output.WriteLine();
        output.WriteLine($"{title}: {list.Count}");
        foreach (var line in list)
        {
            output.WriteLine("  " + line);
        }
    }

    public static string Raw(double? value) => value is { } v ? v.ToString("R", CultureInfo.InvariantCulture) : "null";
}
