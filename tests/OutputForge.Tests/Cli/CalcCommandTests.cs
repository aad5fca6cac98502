using System.Text.Json;
using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>`outputforge calc`: the QC statistician's single numbers, checked against published values.</summary>
public sealed class CalcCommandTests
{
    private static (int Code, string Output, string Error) Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var code = Program.Run(["calc", .. args], error, output);
        return (code, output.ToString(), error.ToString());
    }

    private static JsonElement Json(params string[] args)
    {
        var (code, output, error) = Run([.. args, "--json"]);
        Assert.True(code == 0, error);
        return JsonDocument.Parse(output).RootElement.Clone();
    }

    [Fact]
    public void Proportion_reproduces_newcombe_table_one()
    {
        // Newcombe RG (1998) Stat Med 17:857-872, Table I, 15/148: Wilson score 0.0624 to 0.1605 (method 3).
        var wilson = Json("proportion", "--events", "15", "--n", "148", "--method", "wilson");
        Assert.Equal(15.0 / 148, wilson.GetProperty("estimate").GetDouble(), 12);
        Assert.Equal(0.0624, wilson.GetProperty("lower").GetDouble(), 4);
        Assert.Equal(0.1605, wilson.GetProperty("upper").GetDouble(), 4);
    }

    [Fact]
    public void Difference_reproduces_newcombe_table_two()
    {
        // Newcombe RG (1998) Stat Med 17:873-890, Table II, example (a) 56/70 vs 48/80: method 10 (hybrid score) 0.0524 to 0.3339.
        var newcombe = Json("difference", "--events1", "56", "--n1", "70", "--events2", "48", "--n2", "80", "--method", "newcombe");
        Assert.Equal(0.2, newcombe.GetProperty("estimate").GetDouble(), 12);
        Assert.Equal(0.0524, newcombe.GetProperty("lower").GetDouble(), 4);
        Assert.Equal(0.3339, newcombe.GetProperty("upper").GetDouble(), 4);
    }

    [Fact]
    public void Table_gives_fisher_for_the_tea_tasting_experiment()
    {
        // Agresti A (2013) Categorical Data Analysis, 3rd ed., section 3.5.2 (Fisher's tea tasting, table 3,1;1,3):
        // two-sided p = 0.486; exactly 34/70 (hypergeometric probabilities 1/70 + 16/70 + 16/70 + 1/70).
        var fisher = Json("table", "--counts", "3,1;1,3", "--test", "fisher");
        Assert.Equal(34.0 / 70, fisher.GetProperty("pValue").GetDouble(), 12);
    }

    [Fact]
    public void Table_gives_pearson_chi_square_with_statistic_and_df()
    {
        // Chi-square of [[10, 20], [30, 40]] by hand: expected 12, 18, 28, 42; X2 = 4/12 + 4/18 + 4/28 + 4/42 = 0.79365...
        var pearson = Json("table", "--counts", "10,20;30,40", "--test", "chi-square");
        Assert.Equal(4.0 / 12 + 4.0 / 18 + 4.0 / 28 + 4.0 / 42, pearson.GetProperty("statistic").GetDouble(), 10);
        Assert.Equal(1, pearson.GetProperty("df").GetDouble());
    }

    [Fact]
    public void Stratified_reports_cmh_common_odds_ratio_and_breslow_day()
    {
        var result = Json("stratified", "--counts", "0,5;2,4|1,4;3,1");
        foreach (var name in new[] { "cmh", "commonOddsRatio", "breslowDay", "breslowDayTarone", "generalAssociation", "rowMeanScores", "correlation" })
        {
            Assert.True(result.TryGetProperty(name, out _), name);
        }
        // For 2 x 2 x K tables the general association statistic is the uncorrected CMH statistic (Agresti 2013, section 6.4).
        Assert.Equal(result.GetProperty("cmh").GetProperty("statistic").GetDouble(),
            result.GetProperty("generalAssociation").GetProperty("statistic").GetDouble(), 9);
    }

    [Fact]
    public void An_estimate_that_does_not_exist_is_null_with_a_note()
    {
        var empty = Json("proportion", "--events", "0", "--n", "0", "--method", "wilson");
        Assert.Equal(JsonValueKind.Null, empty.GetProperty("lower").ValueKind);
        Assert.False(string.IsNullOrEmpty(empty.GetProperty("note").GetString()));
    }

    [Fact]
    public void Table_test_auto_follows_the_tables_rule()
    {
        // Cochran's rule as the responder tables apply it (common practice): expected counts of 3,1;1,3 are all 2 (< 5),
        // so Fisher's exact test, p = 34/70 (Agresti 2013, section 3.5.2, as above); 10,20;30,40 has expected counts
        // 12, 18, 28, 42, so Pearson's chi-square, X2 by hand as above.
        var small = Json("table", "--counts", "3,1;1,3", "--test", "auto");
        Assert.Equal(34.0 / 70, small.GetProperty("pValue").GetDouble(), 12);
        Assert.Equal(FisherExactTest.Compute(new[,] { { 3, 1 }, { 1, 3 } }).Method, small.GetProperty("method").GetString());
        var large = Json("table", "--counts", "10,20;30,40", "--test", "auto");
        Assert.Equal(4.0 / 12 + 4.0 / 18 + 4.0 / 28 + 4.0 / 42, large.GetProperty("statistic").GetDouble(), 10);
    }

    [Fact]
    public void Stratified_gives_the_mantel_haenszel_ratio_and_difference_of_the_tables()
    {
        // The "invented_three" strata of tests/OutputForge.Stats.Tests/Oracles/ratio_strata_oracles.json: epiR 2.0.57
        // epi.2by2 RR.mh.wald (Greenland-Robins variance) and ARisk.mh.sato (Sato variance), the reference the Stats
        // tests hold the table's methods to. Counts as "events1,non-events1;events2,non-events2" per stratum.
        using var oracle = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "ratio_strata_oracles.json")));
        var set = oracle.RootElement.GetProperty("strata").GetProperty("invented_three");
        var result = Json("stratified", "--counts", Counts(set.GetProperty("strata")));
        var epir = set.GetProperty("epir");
        var rr = result.GetProperty("commonRelativeRisk");
        Assert.Equal(epir.GetProperty("rr").GetDouble(), rr.GetProperty("estimate").GetDouble(), 12);
        Assert.Equal(epir.GetProperty("rr_lower").GetDouble(), rr.GetProperty("lower").GetDouble(), 10);
        Assert.Equal(epir.GetProperty("rr_upper").GetDouble(), rr.GetProperty("upper").GetDouble(), 10);
        var rd = result.GetProperty("commonRiskDifference");
        Assert.Equal(epir.GetProperty("rd").GetDouble(), rd.GetProperty("estimate").GetDouble(), 12);
        Assert.Equal(epir.GetProperty("rd_lower").GetDouble(), rd.GetProperty("lower").GetDouble(), 10);
        Assert.Equal(epir.GetProperty("rd_upper").GetDouble(), rd.GetProperty("upper").GetDouble(), 10);
    }

    [Fact]
    public void Stratified_gives_the_stratified_miettinen_nurminen_interval_of_the_tables()
    {
        // The first case of tests/OutputForge.Stats.Tests/Oracles/stratified_mn_oracles.json (an independent
        // reimplementation of Miettinen and Nurminen 1985 with scipy 1.10.1, the reference of the Stats tests).
        using var oracle = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "stratified_mn_oracles.json")));
        var first = oracle.RootElement.GetProperty("cases")[0];
        var mn = Json("stratified", "--counts", Counts(first.GetProperty("strata"))).GetProperty("commonRiskDifferenceMiettinenNurminen");
        Assert.Equal(first.GetProperty("estimate").GetDouble(), mn.GetProperty("estimate").GetDouble(), 10);
        Assert.Equal(first.GetProperty("lower").GetDouble(), mn.GetProperty("lower").GetDouble(), 8);
        Assert.Equal(first.GetProperty("upper").GetDouble(), mn.GetProperty("upper").GetDouble(), 8);
    }

    /// <summary>Strata given as [events1, n1, events2, n2] written as calc's 2 x 2 tables.</summary>
    private static string Counts(JsonElement strata) => string.Join("|", strata.EnumerateArray().Select(s =>
        $"{s[0].GetInt32()},{s[1].GetInt32() - s[0].GetInt32()};{s[2].GetInt32()},{s[3].GetInt32() - s[2].GetInt32()}"));

    [Theory]
    [InlineData("events cannot exceed", "proportion", "--events", "5", "--n", "3", "--method", "wilson")]
    [InlineData("cannot be negative", "difference", "--events1", "-1", "--n1", "3", "--events2", "1", "--n2", "3", "--method", "wald")]
    [InlineData("row 2 has 1 counts but row 1 has 2", "table", "--counts", "1,2;3", "--test", "chi-square")]
    [InlineData("is not a whole non-negative count", "table", "--counts", "1,-2;3,4", "--test", "chi-square")]
    [InlineData("unknown 'pearson' (now called 'chi-square')", "table", "--counts", "1,2;3,4", "--test", "pearson")]
    [InlineData("not between 0.5 and 1", "proportion", "--events", "1", "--n", "3", "--method", "wilson", "--level", "0.4")]
    [InlineData("did you mean 'wilson'?", "proportion", "--events", "1", "--n", "3", "--method", "wilsn")]
    [InlineData("2 x 2 tables only", "table", "--counts", "1,2,3;4,5,6", "--test", "yates")]
    [InlineData("same shape", "stratified", "--counts", "1,2;3,4|1,2,3;4,5,6")]
    [InlineData("--level", "proportion", "--events", "1", "--n", "3", "--method", "wilson", "--level", "95")]
    public void Bad_arguments_are_usage_errors_with_one_line_and_exit_code_1(string message, params string[] args)
    {
        var (code, output, error) = Run(args);
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Empty(output);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains(message, line);
    }
}
