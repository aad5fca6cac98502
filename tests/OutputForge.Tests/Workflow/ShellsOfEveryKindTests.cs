using ClosedXML.Excel;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// Shells of the whole demo package from its specs alone: every table kind has one, every number
/// cell is a placeholder, rows the spec lists are shown by their labels, and rows only the data
/// can give are one placeholder row.
/// </summary>
public sealed class ShellsOfEveryKindTests(ShellsDemoFixture shells) : IClassFixture<ShellsDemoFixture>
{
    public static TheoryData<string> DemoTableIds() => [.. DemoStudyTables.Read().TableIds];

    [Fact]
    public void EveryDemoTableHasAShellInWordAndExcelWithoutData()
    {
        Assert.True(shells.ExitCode == 0, shells.Error);
        Assert.False(Directory.Exists(shells.DataFolder));
        Assert.DoesNotContain("no shell yet", shells.Error);
        var ids = DemoStudyTables.Read().TableIds;
        Assert.Equal(ids.SelectMany(id => new[] { $"shell-{id}.docx", $"shell-{id}.xlsx" }).Order(StringComparer.Ordinal),
            Directory.GetFiles(shells.Output).Select(Path.GetFileName).Order(StringComparer.Ordinal));
    }

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void EveryWordNumberCellIsAPlaceholder(string id)
    {
        var all = DocumentReader.WordTableRows(shells.Word(id));
        Assert.All(all.SelectMany(r => r).Where(c => c.StartsWith("(N=", StringComparison.Ordinal)), c => Assert.Equal("(N=xx)", c));
        var body = shells.WordBody(id);
        Assert.NotEmpty(body);
        Assert.All(body.SelectMany(r => r.Skip(1)), text => Assert.Matches(ShellCellPattern.Placeholders(), text));
        // Stand-in data would show as numbers; the shell has at least one placeholder per data row's table.
        Assert.Contains(body.SelectMany(r => r.Skip(1)), text => text.Contains('x'));
    }

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void EveryExcelNumberCellIsAPlaceholder(string id)
    {
        using var workbook = new XLWorkbook(shells.Excel(id));
        var sheet = workbook.Worksheets.First();
        // No cell holds a number: a real table's numbers are numeric cells.
        Assert.DoesNotContain(sheet.CellsUsed(), c => c.DataType == XLDataType.Number);
        var header = sheet.CellsUsed().Where(c => c.GetString().StartsWith("(N=", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(header);
        Assert.All(header, c => Assert.Equal("(N=xx)", c.GetString()));
        var headerRow = header.Max(c => c.Address.RowNumber);
        var body = sheet.CellsUsed().Where(c => c.Address.RowNumber > headerRow && c.Address.ColumnNumber > 1).ToList();
        Assert.NotEmpty(body);
        Assert.All(body, c => Assert.Matches(ShellCellPattern.Placeholders(), c.GetString()));
    }

    [Fact]
    public void RowsTheSpecListsAppearByTheirLabels()
    {
        var demographics = Labels("14.1.3");
        Assert.Equal(["Age group, n (%)", "<65", ">=65"], demographics.SkipWhile(l => l != "Age group, n (%)").Take(3));
        Assert.Equal(["Sex, n (%)", "Female", "Male"], demographics.SkipWhile(l => l != "Sex, n (%)").Take(3));
        Assert.Equal(["Region, n (%)", "North America", "Europe", "Asia Pacific"], demographics.SkipWhile(l => l != "Region, n (%)").Take(4));
        var disposition = Labels("14.1.2");
        Assert.Equal(["Primary reason for discontinuation", "Adverse event", "Lack of efficacy", "Withdrawal by subject", "Lost to follow-up", "Physician decision"],
            disposition.SkipWhile(l => l != "Primary reason for discontinuation").Take(6));
        Assert.Equal(["Week 4", "Week 8", "Week 12"], Labels("14.2.2.1").Where(l => l.StartsWith("Week ", StringComparison.Ordinal)));
        Assert.Equal(["Week 12"], Labels("14.2.2.2").Where(l => l.StartsWith("Week ", StringComparison.Ordinal)));
        Assert.Equal(["Day 29 (Week 4)", "Day 57 (Week 8)", "Day 85 (Week 12)"], Labels("14.2.3.1").Where(l => l.StartsWith("Day ", StringComparison.Ordinal)));
        var severity = Labels("14.3.1.2");
        Assert.Equal(["Subjects with at least one TEAE", "Mild", "Moderate", "Severe"], severity.Take(4));
        Assert.Equal(["Intent-to-Treat Population", "Safety Population", "Efficacy Evaluable Population", "Per-Protocol Population"], Labels("14.1.1"));
    }

    [Fact]
    public void RowsOnlyTheDataCanGiveAreOnePlaceholderRow()
    {
        var demographics = Labels("14.1.3");
        // Race (ordered by RACEN) and ethnicity (by frequency) list no levels: one placeholder level each, then ethnicity's Missing row.
        Assert.Equal(["Race, n (%)", "xxxxxxxx", ""], demographics.SkipWhile(l => l != "Race, n (%)").Take(3));
        Assert.Equal(["Ethnicity, n (%)", "xxxxxxxx", "Missing", ""], demographics.SkipWhile(l => l != "Ethnicity, n (%)").Take(4));
        foreach (var id in new[] { "14.3.1.1", "14.3.1.3", "14.3.1.4" })
        {
            var rows = shells.WordBody(id);
            // The any-event row, a blank, one system organ class and one preferred term under it (indented).
            Assert.Equal(4, rows.Count);
            Assert.Equal(["", "xxxxxxxx", "xxxxxxxx"], rows.Skip(1).Select(r => r[0]));
        }
        var severity = Labels("14.3.1.2");
        Assert.Equal(2, severity.Count(l => l == "xxxxxxxx"));
    }

    [Fact]
    public void DemographicsWithoutDataDecimalsSayWhatTheShellAssumes()
    {
        Assert.Contains("warning: table 14.1.3: AGE, HEIGHTBL, WEIGHTBL, BMIBL, ITCHBL, DURDIS have no \"dataDecimals\"", shells.Error);
        var age = shells.WordBody("14.1.3").SkipWhile(r => r[0] != "Age (years)").Take(6).ToDictionary(r => r[0], r => r[1]);
        // Whole numbers as collected: mean and median one decimal more, SD two more, min and max as collected (common practice).
        Assert.Equal("x.x (x.xx)", age["Mean (SD)"]);
        Assert.Equal("x.x", age["Median"]);
        Assert.Equal("x, x", age["Min, Max"]);
    }

    [Fact]
    public void WarningsAndNotEstimableMarksOfTheStandInDataAreNotShown()
    {
        foreach (var id in DemoStudyTables.Read().TableIds)
        {
            var paragraphs = DocumentReader.WordParagraphs(shells.Word(id));
            Assert.DoesNotContain(paragraphs, p => p.StartsWith("Warning:", StringComparison.Ordinal) || p.Contains("NE = not estimable", StringComparison.Ordinal));
            Assert.Contains("data: none (mock shell)", DocumentReader.WordFooterText(shells.Word(id)));
        }
    }

    private List<string> Labels(string id) => shells.WordBody(id).Select(r => r[0]).ToList();
}
