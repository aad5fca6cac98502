using System.Globalization;
using System.Text.Json;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>
/// The demo's primary analysis (Table 14.2.1.1, stratified by STRAT1R and STRAT2R) end to end: the
/// stratified rows of the .docx and results.json against values recomputed here from the CSV files with this
/// test's own reader and its own copies of the formulas (Support/StratifiedFormulas: Cochran-Mantel-Haenszel,
/// Mantel-Haenszel risk difference with Sato's variance, relative risk with the Greenland-Robins variance,
/// odds ratio with the Robins-Breslow-Greenland variance, Breslow-Day with Tarone's correction).
/// </summary>
public sealed class DemoStratifiedResponderTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private const string TableId = "14.2.1.1";
    private static readonly string[] Arms = ["Placebo", "QF-217 10 mg", "QF-217 30 mg"];

    /// <summary>Per active arm, the strata (responders and subjects, active then placebo), non-responder imputation.</summary>
    private Dictionary<string, List<(int A, int N1, int C, int N2)>> Strata()
    {
        var adsl = SimpleCsv.Read(demo.Data("adsl.csv")).Where(s => s["ITTFL"] == "Y").ToList();
        var responders = SimpleCsv.Read(demo.Data("adeff.csv"))
            .Where(r => r["PARAMCD"] == "ITCHR50" && r["AVISIT"] == "Week 12" && r["ANL01FL"] == "Y" && r["AVALC"] == "Y")
            .Select(r => r["USUBJID"]).ToHashSet();
        var levels = adsl.Select(s => s["STRAT1R"] + "|" + s["STRAT2R"]).Distinct().OrderBy(s => s, StringComparer.Ordinal).ToList();
        return Arms.Skip(1).ToDictionary(arm => arm, arm => levels.Select(level =>
        {
            var inStratum = adsl.Where(s => s["STRAT1R"] + "|" + s["STRAT2R"] == level).ToList();
            var active = inStratum.Where(s => s["TRT01P"] == arm).ToList();
            var placebo = inStratum.Where(s => s["TRT01P"] == "Placebo").ToList();
            return (active.Count(s => responders.Contains(s["USUBJID"])), active.Count, placebo.Count(s => responders.Contains(s["USUBJID"])), placebo.Count);
        }).ToList());
    }

    private static string Round(double value, int decimals) =>
        Math.Round((decimal)value, decimals, MidpointRounding.AwayFromZero).ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static string PValue(double p) => p < 0.001 ? "<0.001" : p > 0.999 ? ">0.999" : Round(p, 3);

    [Fact]
    public void Word_shows_the_recomputed_stratified_rows()
    {
        var strata = Strata();
        Assert.All(strata.Values, s => Assert.Equal(6, s.Count));
        Assert.All(strata.Values.SelectMany(s => s), s => Assert.True(s.N1 > 0 && s.N2 > 0));
        string[] Row(Func<List<(int, int, int, int)>, string> cell) => Arms.Select(a => a == "Placebo" ? "" : cell(strata[a])).ToArray();
        var expected = new Dictionary<string, string[]>
        {
            ["Difference in proportions, % [d]"] = Row(s => Round(100 * StratifiedFormulas.RiskDifference(s).Estimate, 1)),
            ["95% CI [d]"] = Row(s => $"({Round(100 * StratifiedFormulas.RiskDifference(s).Lower, 1)}, {Round(100 * StratifiedFormulas.RiskDifference(s).Upper, 1)})"),
            ["CMH p-value [e]"] = Row(s => PValue(StratifiedFormulas.Cmh(s).P)),
            ["Breslow-Day p-value [f]"] = Row(s => PValue(StratifiedFormulas.BreslowDayTarone(s).P)),
            ["Relative risk [g]"] = Row(s => Round(StratifiedFormulas.RelativeRisk(s).Estimate, 2)),
            ["95% CI [g]"] = Row(s => $"({Round(StratifiedFormulas.RelativeRisk(s).Lower, 2)}, {Round(StratifiedFormulas.RelativeRisk(s).Upper, 2)})"),
            ["Odds ratio [h]"] = Row(s => Round(StratifiedFormulas.OddsRatio(s).Estimate, 2)),
            ["95% CI [h]"] = Row(s => $"({Round(StratifiedFormulas.OddsRatio(s).Lower, 2)}, {Round(StratifiedFormulas.OddsRatio(s).Upper, 2)})"),
        };
        var rows = DocumentReader.WordTableRows(demo.Output($"table-{TableId}.docx"));
        foreach (var (label, cells) in expected)
        {
            Assert.Equal(cells, rows.Single(r => r[0] == label).Skip(1));
        }
    }

    [Fact]
    public void Results_json_holds_the_stratified_values_at_full_precision()
    {
        var strata = Strata();
        using var json = JsonDocument.Parse(File.ReadAllText(demo.Output("results.json")));
        var records = json.RootElement.GetProperty("records").EnumerateArray().Where(r => r.GetProperty("table").GetString() == TableId).ToList();
        double Value(string row, string column, string statistic) => records.Single(r =>
            r.GetProperty("row").GetString() == row && r.GetProperty("column").GetString() == column &&
            r.GetProperty("statistic").GetString() == statistic).GetProperty("value").GetDouble();
        foreach (var (arm, key) in new[] { ("QF-217 10 mg", "qf-217-10-mg"), ("QF-217 30 mg", "qf-217-30-mg") })
        {
            var s = strata[arm];
            var rd = StratifiedFormulas.RiskDifference(s);
            Assert.Equal(100 * rd.Estimate, Value("stratified-difference", key, "estimate"), 10);
            Assert.Equal(100 * rd.Lower, Value("stratified-difference-ci", key, "lower"), 9);
            Assert.Equal(100 * rd.Upper, Value("stratified-difference-ci", key, "upper"), 9);
            var cmh = StratifiedFormulas.Cmh(s);
            Assert.Equal(cmh.Statistic, Value("cmh-p-value", key, "statistic"), 9);
            Assert.Equal(cmh.P, Value("cmh-p-value", key, "pValue"), 12);
            Assert.Equal(6, Value("cmh-p-value", key, "strata"));
            var bd = StratifiedFormulas.BreslowDayTarone(s);
            Assert.Equal(bd.Statistic, Value("homogeneity-p-value", key, "statistic"), 8);
            Assert.Equal(bd.Df, Value("homogeneity-p-value", key, "df"));
            var rr = StratifiedFormulas.RelativeRisk(s);
            Assert.Equal(rr.Estimate, Value("relative-risk", key, "estimate"), 10);
            Assert.Equal(rr.Lower, Value("relative-risk-ci", key, "lower"), 9);
            Assert.Equal(rr.Upper, Value("relative-risk-ci", key, "upper"), 9);
            var or = StratifiedFormulas.OddsRatio(s);
            Assert.Equal(or.Estimate, Value("odds-ratio", key, "estimate"), 10);
            Assert.Equal(or.Lower, Value("odds-ratio-ci", key, "lower"), 9);
            Assert.Equal(or.Upper, Value("odds-ratio-ci", key, "upper"), 9);
        }
    }

    [Fact]
    public void Footnotes_name_every_method_and_the_strata()
    {
        var text = File.ReadAllText(demo.Output($"table-{TableId}.txt"));
        foreach (var phrase in new[] { "Sato's variance", "Cochran-Mantel-Haenszel test", "Tarone's correction", "Greenland-Robins variance",
                     "Robins-Breslow-Greenland", "Stratified by STRAT1R and STRAT2R", "Strata: each combination of STRAT1R / STRAT2R values" })
        {
            Assert.Contains(phrase, text);
        }
    }
}
