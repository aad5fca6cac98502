using OutputForge.Tests.Oracles;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.CategoricalByVisit;

/// <summary>
/// The categorical-by-visit kind on the CDISC pilot study's CIBIC+ (adqscibc.csv, Weeks 8, 16 and 24,
/// Efficacy Population, read in place from ../shared, never copied) against R 4.2.2 with vcdExtra 0.8.2
/// and base R mantelhaen.test: the validation spec's settings (LOCF, row mean scores stratified by
/// SITEGR1, each xanomeline dose vs placebo) and four others (one with modified ridit scores within each site group), values in
/// Oracles/pilot_categorical_by_visit_oracles.json from Oracles/generate_categorical_by_visit_oracles.R.
/// No published CIBIC+ values are in ../shared/reference, so the check is against R only.
/// </summary>
public sealed class PilotCategoricalByVisitTableTests
{
    private const string OracleFile = "pilot_categorical_by_visit_oracles.json";

    private static readonly CategoricalByVisitOracle.Study Pilot = new("efficacy", "EFFFL = 'Y'", "adqscibc", "adqscibc.csv", "CIBICVAL",
        ["Week 8", "Week 16", "Week 24"], [], "Placebo", "TRT01PN");

    [PilotDataFact]
    public void Every_variant_matches_r()
    {
        var oracle = CategoricalByVisitOracle.Read(OracleFile);
        var data = RepositoryRoot.Shared(PilotDataFactAttribute.Folder)!;
        foreach (var variant in oracle.GetProperty("variants").EnumerateObject())
        {
            var result = CategoricalByVisitOracle.Analyze(Pilot, data, variant.Value);
            var compared = CategoricalByVisitOracle.AssertAgrees(result, oracle, variant.Name, 1e-9);
            Assert.True(compared >= 144 + 3 * 4, $"{variant.Name}: only {compared} reference values");
        }
    }

    [PilotDataFact]
    public void The_validation_spec_runs_and_shows_the_week_24_p_values()
    {
        using var output = new TempFolder();
        var log = new StringWriter();
        var exit = OutputForge.Cli.Program.Run(["run", "--spec", System.IO.Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01"),
            "--data", RepositoryRoot.Shared(PilotDataFactAttribute.Folder)!, "--out", output.Path, "--format", "docx", "--tables", "14-3.02"], log);
        Assert.True(exit == 0, log.ToString());
        var rows = DocumentReader.WordTableRows(System.IO.Path.Combine(output.Path, "table-14-3.02.docx"));
        var n = rows.Where(r => r[0] == "n").ToList();
        Assert.Equal(3, n.Count);
        // Week 24, LOCF, row mean scores by SITEGR1: p = 0.5133 (low dose) and 0.8457 (high dose) in the oracle file, shown to 3 decimals.
        var oracle = CategoricalByVisitOracle.Read(OracleFile);
        string Shown(string column) => oracle.GetProperty("records").EnumerateArray()
            .Single(r => r.GetProperty("variant").GetString() == "14-3.02" && r.GetProperty("row").GetString() == "week-24/n"
                         && r.GetProperty("column").GetString() == column && r.GetProperty("statistic").GetString() == "pValue")
            .GetProperty("value").GetDouble().ToString("0.000", System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal([Shown("p-value-xanomeline-low-dose"), Shown("p-value-xanomeline-high-dose")], n[2].Skip(4));
    }
}
