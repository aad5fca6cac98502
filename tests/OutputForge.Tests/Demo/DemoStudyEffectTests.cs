using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

/// <summary>
/// The treatment effect built into the invented study shows in the written data. The ranges are the
/// design targets of the demo study itself (Week 12 responder rate about 22-28% placebo, 38-45% 10 mg,
/// 50-58% 30 mg; Week 12 mean change about -1.6 / -2.5 / -3.2 with SD about 2); they are not
/// statistical reference values.
/// </summary>
public sealed class DemoStudyEffectTests : IClassFixture<DemoStudyFiles>
{
    private static readonly string[] Arms = ["Placebo", "QF-217 10 mg", "QF-217 30 mg"];
    private readonly DemoStudyFiles _study;

    public DemoStudyEffectTests(DemoStudyFiles study) => _study = study;

    private static double[] Week12ResponderRates(CsvTable adeff) =>
        Arms.Select(arm =>
        {
            var rows = adeff.Rows.Where(r => adeff.Get(r, "PARAMCD") == "ITCHR50" && adeff.Get(r, "AVISITN") == "12"
                                             && adeff.Get(r, "ANL01FL") == "Y" && adeff.Get(r, "TRT01P") == arm).ToList();
            return rows.Count(r => adeff.Get(r, "AVALC") == "Y") / (double)rows.Count;
        }).ToArray();

    private static List<double>[] Week12Changes(CsvTable adeff) =>
        Arms.Select(arm => adeff.Rows
            .Where(r => adeff.Get(r, "PARAMCD") == "ITCH" && adeff.Get(r, "AVISITN") == "12" && adeff.Get(r, "ANL01FL") == "Y"
                        && adeff.Get(r, "TRT01P") == arm)
            .Select(r => (double)CsvTable.Number(adeff.Get(r, "CHG"))).ToList()).ToArray();

    [Fact]
    public void Week_12_response_increases_with_dose_in_the_default_study()
    {
        var rates = Week12ResponderRates(_study.Adeff);
        Assert.True(rates[0] < rates[1] && rates[1] < rates[2], string.Join(" / ", rates));
        var meanChange = Week12Changes(_study.Adeff).Select(c => c.Average()).ToArray();
        Assert.True(meanChange[0] > meanChange[1] && meanChange[1] > meanChange[2], string.Join(" / ", meanChange));
    }

    [Fact]
    public void A_large_study_reproduces_the_design_targets()
    {
        var folder = DemoStudyFiles.NewTempFolder();
        try
        {
            DemoStudyGenerator.WriteCsv(folder, new DemoStudyOptions(6000, 301));
            var adeff = CsvTable.Read(Path.Combine(folder, "adeff.csv"));
            var adae = CsvTable.Read(Path.Combine(folder, "adae.csv"));
            var adsl = CsvTable.Read(Path.Combine(folder, "adsl.csv"));

            var rates = Week12ResponderRates(adeff);
            Assert.InRange(rates[0], 0.22, 0.28);
            Assert.InRange(rates[1], 0.38, 0.45);
            Assert.InRange(rates[2], 0.50, 0.58);

            var changes = Week12Changes(adeff);
            double[] target = [-1.6, -2.5, -3.2];
            for (var a = 0; a < 3; a++)
            {
                var mean = changes[a].Average();
                var sd = Math.Sqrt(changes[a].Sum(c => (c - mean) * (c - mean)) / (changes[a].Count - 1));
                Assert.InRange(mean, target[a] - 0.4, target[a] + 0.4);
                Assert.InRange(sd, 1.7, 2.4);
            }

            Assert.True(Week8Week12Correlation(adeff) > 0.5, "values of one subject should be correlated");

            var exposed = Arms.Select(arm => adsl.Rows.Count(r => adsl.Get(r, "TRT01A") == arm)).ToArray();
            var nausea = Arms.Select((arm, i) => adae.Rows
                .Where(r => adae.Get(r, "AEDECOD") == "Nausea" && adae.Get(r, "TRTA") == arm && adae.Get(r, "TRTEMFL") == "Y")
                .Select(r => adae.Get(r, "USUBJID")).Distinct().Count() / (double)exposed[i]).ToArray();
            Assert.True(nausea[0] < nausea[1] && nausea[1] < nausea[2], string.Join(" / ", nausea));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private static double Week8Week12Correlation(CsvTable adeff)
    {
        var byVisit = adeff.Rows.Where(r => adeff.Get(r, "PARAMCD") == "ITCH" && adeff.Get(r, "ANL01FL") == "Y")
            .ToLookup(r => adeff.Get(r, "AVISITN"));
        var week8 = byVisit["8"].ToDictionary(r => adeff.Get(r, "USUBJID"), r => (double)CsvTable.Number(adeff.Get(r, "CHG")));
        var pairs = byVisit["12"].Where(r => week8.ContainsKey(adeff.Get(r, "USUBJID")))
            .Select(r => (X: week8[adeff.Get(r, "USUBJID")], Y: (double)CsvTable.Number(adeff.Get(r, "CHG")))).ToList();
        var mx = pairs.Average(p => p.X);
        var my = pairs.Average(p => p.Y);
        var sxy = pairs.Sum(p => (p.X - mx) * (p.Y - my));
        var sxx = pairs.Sum(p => (p.X - mx) * (p.X - mx));
        var syy = pairs.Sum(p => (p.Y - my) * (p.Y - my));
        return sxy / Math.Sqrt(sxx * syy);
    }
}
