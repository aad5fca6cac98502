using OutputForge.Kinds.CategoricalByVisit;
using OutputForge.Data;
using OutputForge.Spec;
using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.CategoricalByVisit;

/// <summary>
/// Tables 14.2.4.1 and 14.2.4.2 of the demo package (subject global impression of change in itch by visit,
/// observed and LOCF, CMH row mean scores stratified by STRAT1R x STRAT2R, each dose vs placebo) and four
/// further settings (general association over all arms unstratified; nonzero correlation over all arms by
/// STRAT1R; general association by STRAT2R with LOCF; row mean scores with modified ridit scores within the
/// STRAT1R x STRAT2R strata, vcdExtra's "midrank") against R 4.2.2 with vcdExtra 0.8.2 and base R
/// mantelhaen.test, values in Oracles/categorical_by_visit_oracles.json from
/// Oracles/generate_categorical_by_visit_oracles.R run on the default demo study (adeff.csv pinned by
/// SHA-256 in DemoStudyFingerprintTests).
/// </summary>
public sealed class DemoCategoricalByVisitTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private const string OracleFile = "categorical_by_visit_oracles.json";

    private static readonly CategoricalByVisitOracle.Study Demo = new("itt", "ITTFL = 'Y'", "adeff", "adeff.csv", "SGICITCH",
        ["Week 4", "Week 8", "Week 12"], [], "Placebo", "TRT01PN");

    public static TheoryData<string> Variants() => new(CategoricalByVisitOracle.Variants(OracleFile));

    [Theory]
    [MemberData(nameof(Variants))]
    public void Counts_percentages_and_statistics_match_r(string variant)
    {
        Assert.True(demo.ExitCode == 0, demo.Log);
        var oracle = CategoricalByVisitOracle.Read(OracleFile);
        var result = variant.StartsWith("14.", StringComparison.Ordinal)
            ? AnalyzeDemoTable(variant)
            : CategoricalByVisitOracle.Analyze(Demo, Path.Combine(demo.Root, "data"), oracle.GetProperty("variants").GetProperty(variant));
        var compared = CategoricalByVisitOracle.AssertAgrees(result, oracle, variant, 1e-9);
        // 3 visits x 3 arms x (n, missing, 7 x (n, percent)) = 144 counts and percentages, and at least one test per visit.
        Assert.True(compared >= 144 + 3 * 4, $"{variant}: only {compared} reference values");
    }

    [Fact]
    public void The_word_table_shows_a_row_per_category_and_the_p_value_columns()
    {
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.2.4.1.docx"));
        Assert.Equal(3, rows.Count(r => r[0] == "Very much worse"));
        var week4 = rows.First(r => r[0] == "n");
        Assert.Equal(6, week4.Count);
        Assert.All(week4.Skip(4), cell => Assert.Matches(@"^(<0\.001|0\.\d{3}|1\.000)$", cell));
    }

    private OutputForge.Results.TableResult AnalyzeDemoTable(string id)
    {
        var package = SpecLoader.Load(Path.Combine(demo.Root, "specs", "demo"));
        var data = StudyData.Load(package.Study, Path.Combine(demo.Root, "data"));
        return new CategoricalByVisitAnalysis().Analyze(package.Study, package.Tables.Single(t => t.Id == id), data);
    }
}
