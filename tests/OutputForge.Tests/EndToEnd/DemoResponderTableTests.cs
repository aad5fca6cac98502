using System.Globalization;
using System.Text.Json;
using ClosedXML.Excel;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>
/// The demo package end to end: the numbers in the .docx, the .xlsx and results.json are checked
/// against values recomputed here from the CSV files, with this test's own CSV reader and its own
/// copies of the textbook formulas (Wilson 1927 / Newcombe 1998; Pearson chi-square as z squared).
/// </summary>
public sealed class DemoResponderTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private static readonly string[] Arms = ["Placebo", "QF-217 10 mg", "QF-217 30 mg"];

    private sealed record ArmCounts(int N, int Evaluated, int Responders)
    {
        public int Denominator(bool exclude) => exclude ? Evaluated : N;
    }

    private Dictionary<string, ArmCounts> Recompute(string populationFlag, string visit)
    {
        var adsl = SimpleCsv.Read(demo.Data("adsl.csv"));
        var population = adsl.Where(s => s[populationFlag] == "Y").ToDictionary(s => s["USUBJID"], s => s["TRT01P"]);
        var records = SimpleCsv.Read(demo.Data("adeff.csv"))
            .Where(r => r["PARAMCD"] == "ITCHR50" && r["AVISIT"] == visit && r["ANL01FL"] == "Y" && population.ContainsKey(r["USUBJID"]))
            .ToDictionary(r => r["USUBJID"], r => r["AVALC"] == "Y");
        return Arms.ToDictionary(arm => arm, arm =>
        {
            var subjects = population.Where(p => p.Value == arm).Select(p => p.Key).ToList();
            return new ArmCounts(subjects.Count, subjects.Count(records.ContainsKey), subjects.Count(s => records.TryGetValue(s, out var r) && r));
        });
    }

    private static string Round(double value, int decimals) =>
        Math.Round((decimal)value, decimals, MidpointRounding.AwayFromZero).ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static string CountPercent(int n, int d) => n == 0 ? "0" : $"{n} ({Round(100.0 * n / d, 1)})";

    private static string Interval((double Lower, double Upper) ci) => $"({Round(100 * ci.Lower, 1)}, {Round(100 * ci.Upper, 1)})";

    private static string PValue(double p) => p < 0.001 ? "<0.001" : p > 0.999 ? ">0.999" : Round(p, 3);

    /// <summary>The expected display, row label to the texts of the three arm columns.</summary>
    private Dictionary<string, string[]> ExpectedRows(string populationFlag, string visit, bool exclude)
    {
        var counts = Recompute(populationFlag, visit);
        var control = counts["Placebo"];
        var rows = new Dictionary<string, string[]>
        {
            ["Responders, n (%)"] = Arms.Select(a => CountPercent(counts[a].Responders, counts[a].Denominator(exclude))).ToArray(),
            ["95% CI [a]"] = Arms.Select(a => Interval(IndependentFormulas.Wilson(counts[a].Responders, counts[a].Denominator(exclude)))).ToArray(),
            ["Non-responders, n (%)"] = Arms.Select(a => CountPercent(counts[a].Denominator(exclude) - counts[a].Responders, counts[a].Denominator(exclude))).ToArray(),
            ["Difference in proportions, % [b]"] = Arms.Select(a => a == "Placebo" ? "" :
                Round(100.0 * ((double)counts[a].Responders / counts[a].Denominator(exclude) - (double)control.Responders / control.Denominator(exclude)), 1)).ToArray(),
            ["95% CI [b]"] = Arms.Select(a => a == "Placebo" ? "" : Interval(IndependentFormulas.Newcombe(
                counts[a].Responders, counts[a].Denominator(exclude), control.Responders, control.Denominator(exclude)))).ToArray(),
            ["p-value [c]"] = Arms.Select(a => a == "Placebo" ? "" : PValue(IndependentFormulas.PearsonPValue(
                counts[a].Responders, counts[a].Denominator(exclude), control.Responders, control.Denominator(exclude)))).ToArray(),
        };
        rows[exclude ? "Subjects evaluated, n" : "No assessment, counted as non-responder, n"] = exclude
            ? Arms.Select(a => counts[a].Evaluated.ToString(CultureInfo.InvariantCulture)).ToArray()
            : Arms.Select(a => (counts[a].N - counts[a].Evaluated).ToString(CultureInfo.InvariantCulture)).ToArray();
        return rows;
    }

    public static TheoryData<string, string, string, bool> Tables => new()
    {
        { "14.2.1.1", "ITTFL", "Week 12", false },
        { "14.2.1.2", "PPROTFL", "Week 12", true },
        { "14.2.1.3", "ITTFL", "Week 4", false },
    };

    [Fact]
    public void The_demo_command_succeeds_and_writes_every_output()
    {
        Assert.True(demo.ExitCode == 0, demo.Log);
        foreach (var id in new[] { "14.2.1.1", "14.2.1.2", "14.2.1.3", "14.2.1.4" })
        {
            foreach (var extension in new[] { ".docx", ".xlsx", ".txt" })
            {
                Assert.True(File.Exists(demo.Output($"table-{id}{extension}")), $"table-{id}{extension} missing");
            }
        }
        Assert.True(File.Exists(demo.Output("results.json")));
        // Every table the demo study lists is written (the list grows as table kinds are added).
        using var study = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "specs", "demo", "study.json")));
        Assert.Contains($"{study.RootElement.GetProperty("tables").GetArrayLength()} tables", demo.Log);
    }

    [Theory]
    [MemberData(nameof(Tables))]
    public void Word_shows_the_recomputed_numbers(string tableId, string flag, string visit, bool exclude)
    {
        var expected = ExpectedRows(flag, visit, exclude);
        var rows = DocumentReader.WordTableRows(demo.Output($"table-{tableId}.docx"));
        var counts = Recompute(flag, visit);
        // The study spec groups the two QF-217 doses under one spanning header (treatment.groups).
        Assert.Equal(["", "QF-217"], rows[0].Skip(1));
        Assert.Equal(Arms, rows[1].Skip(1));
        Assert.Equal(Arms.Select(a => $"(N={counts[a].N})"), rows[2].Skip(1));
        foreach (var (label, cells) in expected)
        {
            var row = rows.Single(r => r[0] == label);
            Assert.Equal(cells, row.Skip(1));
        }
    }

    [Theory]
    [MemberData(nameof(Tables))]
    public void Excel_shows_the_recomputed_numbers_with_numeric_cells(string tableId, string flag, string visit, bool exclude)
    {
        var expected = ExpectedRows(flag, visit, exclude);
        using var workbook = new XLWorkbook(demo.Output($"table-{tableId}.xlsx"));
        var sheet = workbook.Worksheets.First();
        foreach (var (label, cells) in expected)
        {
            var labelCell = DocumentReader.FindLabel(sheet, label);
            var shown = Enumerable.Range(1, 3).Select(i => labelCell.CellRight(i).GetFormattedString()).ToArray();
            Assert.Equal(cells, shown);
        }
        var difference = DocumentReader.FindLabel(sheet, "Difference in proportions, % [b]").CellRight(2);
        Assert.Equal(XLDataType.Number, difference.DataType);
        Assert.Equal(double.Parse(expected["Difference in proportions, % [b]"][1], CultureInfo.InvariantCulture), difference.GetDouble(), 12);
    }

    [Theory]
    [MemberData(nameof(Tables))]
    public void Results_json_holds_full_precision_values_that_agree(string tableId, string flag, string visit, bool exclude)
    {
        var counts = Recompute(flag, visit);
        using var json = JsonDocument.Parse(File.ReadAllText(demo.Output("results.json")));
        var records = json.RootElement.GetProperty("records").EnumerateArray()
            .Where(r => r.GetProperty("table").GetString() == tableId)
            .ToList();
        double Value(string row, string column, string statistic) => records.Single(r =>
            r.GetProperty("row").GetString() == row && r.GetProperty("column").GetString() == column &&
            r.GetProperty("statistic").GetString() == statistic).GetProperty("value").GetDouble();

        var control = counts["Placebo"];
        foreach (var (arm, key) in Arms.Zip(new[] { "placebo", "qf-217-10-mg", "qf-217-30-mg" }))
        {
            var c = counts[arm];
            var d = c.Denominator(exclude);
            Assert.Equal(c.N, Value("header", key, "N"));
            Assert.Equal(c.Responders, Value("responders", key, "n"));
            Assert.Equal(100.0 * c.Responders / d, Value("responders", key, "percent"), 10);
            var (lower, upper) = IndependentFormulas.Wilson(c.Responders, d);
            Assert.Equal(100 * lower, Value("responders-ci", key, "lower"), 9);
            Assert.Equal(100 * upper, Value("responders-ci", key, "upper"), 9);
            if (arm == "Placebo")
            {
                continue;
            }
            var (dl, du) = IndependentFormulas.Newcombe(c.Responders, d, control.Responders, control.Denominator(exclude));
            Assert.Equal(100 * dl, Value("difference-ci", key, "lower"), 9);
            Assert.Equal(100 * du, Value("difference-ci", key, "upper"), 9);
            var p = IndependentFormulas.PearsonPValue(c.Responders, d, control.Responders, control.Denominator(exclude));
            Assert.Equal(p, Value("p-value", key, "pValue"), 12);
        }
    }

    [Fact]
    public void Every_document_carries_the_caution_and_the_source()
    {
        var paragraphs = DocumentReader.WordFooterParagraphs(demo.Output("table-14.2.1.1.docx"));
        Assert.Contains(paragraphs, p => p.StartsWith("Source: tables/14.2.1.1-itch-responders-week12-itt.json", StringComparison.Ordinal) && p.Contains("verified under your own validated processes"));
        var text = File.ReadAllText(demo.Output("table-14.2.1.1.txt"));
        Assert.Contains("Table 14.2.1.1", text);
        Assert.Contains("Intent-to-Treat Population", text);
    }
}
