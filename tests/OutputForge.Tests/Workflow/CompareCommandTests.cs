using ClosedXML.Excel;

namespace OutputForge.Tests.Workflow;

/// <summary>`outputforge compare` on the demo package against a QC file programmed independently here.</summary>
public sealed class CompareCommandTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    [Fact]
    public void IndependentQcOfTable1421Matches()
    {
        var lines = IndependentQcFile.Lines(demo.Data);
        var qc = demo.Write("qc-good.csv", string.Join("\n", lines) + "\n");

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.True(code == 0, output + error);
        Assert.StartsWith($"matched {lines.Count - 1}, mismatched 0,", output);
        Assert.EndsWith("only in QC 0", output.Split('\n')[0].TrimEnd());
        Assert.True(File.Exists(demo.File("qc-good.compare.xlsx")));
        Assert.Contains("PASSED", File.ReadAllText(demo.File("qc-good.compare.txt")));
    }

    [Fact]
    public void OneWrongNumberFailsAndIsNamedWithBothValues()
    {
        var lines = IndependentQcFile.Lines(demo.Data);
        var index = lines.FindIndex(l => l.StartsWith("14.2.1.1,\"Responders, n (%)\",Placebo,n,", StringComparison.Ordinal));
        var right = int.Parse(lines[index].Split(',').Last(), System.Globalization.CultureInfo.InvariantCulture);
        lines[index] = $"14.2.1.1,\"Responders, n (%)\",Placebo,n,{right + 1}";
        var qc = demo.Write("qc-wrong.csv", string.Join("\n", lines) + "\n");
        var report = demo.File("reports/wrong.xlsx");

        var (code, output, _) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--report", report]);

        Assert.Equal(2, code);
        Assert.StartsWith($"matched {lines.Count - 2}, mismatched 1, ", output);
        Assert.Contains($"mismatch (QC line {index + 1}): 14.2.1.1 / responders / placebo / n: production {right}, QC {right + 1}", output);
        using var workbook = new XLWorkbook(report);
        var sheet = workbook.Worksheet("Mismatches");
        Assert.Equal(2, sheet.LastRowUsed().RowNumber());
        Assert.Equal("responders", sheet.Cell(2, 3).GetString());
        Assert.Equal(right.ToString(System.Globalization.CultureInfo.InvariantCulture), sheet.Cell(2, 8).GetString());
        Assert.Equal((right + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), sheet.Cell(2, 10).GetString());
        Assert.Contains("FAILED", File.ReadAllText(demo.File("reports/wrong.txt")));
    }

    [Fact]
    public void UnknownAndAmbiguousPlacesAreOnlyInQcWithTheReason()
    {
        var qc = demo.Write("qc-places.csv",
            "table,row,column,statistic,value\n" +
            "14.2.1.1,Responder rate,placebo,n,3\n" +
            "14.2.1.1,95% CI,placebo,lower,1\n" +
            "14.9,responders,placebo,n,3\n" +
            "14.2.1.1,responders,=SUM(A1),n,3\n");
        var report = demo.File("places.xlsx");

        var (code, output, _) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--report", report]);

        Assert.Equal(2, code);
        Assert.Contains("only in QC 4", output);
        Assert.Contains("no row 'Responder rate' in table 14.2.1.1", output);
        Assert.Contains("row '95% CI' fits several rows (responders-ci, difference-ci, stratified-difference-ci, relative-risk-ci, odds-ratio-ci); write the row key instead", output);
        Assert.Contains("no table '14.9' in production", output);
        using var workbook = new XLWorkbook(report);
        var cell = workbook.Worksheet("Only in QC").Cell(5, 4);
        Assert.Equal("=SUM(A1)", cell.GetString());
        Assert.False(cell.HasFormula);
    }

    [Fact]
    public void AQcFileWithoutTheValueColumnIsAnInputError()
    {
        var qc = demo.Write("qc-bad.csv", "table,row,column,statistic\n14.2.1.1,responders,placebo,n\n");

        var (code, _, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.Equal(2, code);
        Assert.Contains("qc-bad.csv line 1: the QC file has no column value", error);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public void AnAbsoluteToleranceIsApplied()
    {
        var results = OutputForge.Workflow.RunResults.Read(demo.Before);
        var percent = results.Records.First(r => r.Table == "14.2.1.1" && r.Row == "responders" && r.Column == "placebo" && r.Statistic == "percent");
        var qc = demo.Write("qc-tolerance.csv",
            "table,row,column,statistic,value\n" +
            $"14.2.1.1,responders,placebo,percent,{(percent.Value!.Value + 0.004).ToString("R", System.Globalization.CultureInfo.InvariantCulture)}\n");

        Assert.Equal(0, WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--tolerance", "0.005"]).ExitCode);
        Assert.Equal(2, WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--tolerance", "0.001"]).ExitCode);
        var (code, _, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--tolerance", "wide"]);
        Assert.Equal(1, code);
        Assert.Contains("--tolerance: 'wide' is neither 'displayed' nor a non-negative number", error);
    }
}
