using System.Globalization;
using System.Text;
using System.Text.Json;
using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>
/// `outputforge calc noninferiority`, `calc logistic` and `calc mmrm` against the reference values of the statistics
/// tests: tests/OutputForge.Stats.Tests/Oracles/adjusted_logistic_oracles.json (R 4.2.2 glm, the profile likelihood
/// and Farrington-Manning written in R from the papers) and mmrm_oracles.json (R 4.2.2 nlme 3.1-162 polished to the
/// optimum, pbkrtest 0.5.2 Kenward-Roger), through the command line, CSV reading included.
/// </summary>
public sealed class CalcModelCommandTests
{
    private static readonly string Oracles = Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles");

    private static JsonElement Oracle(string file) => JsonDocument.Parse(File.ReadAllText(Path.Combine(Oracles, file))).RootElement.Clone();

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

    private static void Close(double expected, double actual, double tolerance, string what) =>
        Assert.True(Math.Abs(expected - actual) <= tolerance * Math.Max(1, Math.Abs(expected)), $"{what}: reference {expected:R}, calc {actual:R}");

    /// <summary>The demo study's Week 12 responder records of the oracle as a CSV file (Y/N response, text arms).</summary>
    private static string DemoCsv(TempFolder folder)
    {
        var r = Oracle("adjusted_logistic_oracles.json").GetProperty("demo").GetProperty("records");
        var text = new StringBuilder("SUBJ,RESP,TRT01P,STRAT1R,STRAT2R,ITCHBL\n");
        var y = r.GetProperty("y").EnumerateArray().ToList();
        for (var i = 0; i < y.Count; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"S{i:000},{(y[i].GetInt32() == 1 ? "Y" : "N")},{r.GetProperty("TRT01P")[i].GetString()},")
                .Append(CultureInfo.InvariantCulture, $"{r.GetProperty("STRAT1R")[i].GetString()},{r.GetProperty("STRAT2R")[i].GetString()},{r.GetProperty("ITCHBL")[i].GetDouble().ToString("R", CultureInfo.InvariantCulture)}\n");
        }
        return folder.Write("responders.csv", text.ToString());
    }

    [Fact]
    public void Logistic_from_a_csv_gives_the_R_odds_ratios_profile_limits_and_marginal_difference()
    {
        using var folder = new TempFolder();
        var result = Json("logistic", "--data", DemoCsv(folder), "--response", "RESP", "--treatment", "TRT01P", "--control", "Placebo",
            "--factors", "STRAT1R,STRAT2R", "--covariates", "ITCHBL");
        var expected = Oracle("adjusted_logistic_oracles.json").GetProperty("demo");
        Assert.Equal("maximum likelihood", result.GetProperty("estimation").GetString());
        Close(expected.GetProperty("deviance").GetDouble(), result.GetProperty("deviance").GetDouble(), 1e-10, "deviance");
        var comparisons = result.GetProperty("comparisons").EnumerateArray().ToList();
        var reference = expected.GetProperty("comparisons").EnumerateArray().ToList();
        Assert.Equal(2, comparisons.Count);
        for (var k = 0; k < 2; k++)
        {
            var (c, e) = (comparisons[k], reference[k]);
            Assert.Equal("Placebo", c.GetProperty("control").GetString());
            Close(e.GetProperty("oddsRatio").GetDouble(), c.GetProperty("oddsRatioWald").GetProperty("estimate").GetDouble(), 1e-8, "odds ratio");
            Close(e.GetProperty("profileLower").GetDouble(), c.GetProperty("oddsRatioProfile").GetProperty("lower").GetDouble(), 1e-7, "profile lower");
            Close(e.GetProperty("profileUpper").GetDouble(), c.GetProperty("oddsRatioProfile").GetProperty("upper").GetDouble(), 1e-7, "profile upper");
            Close(e.GetProperty("lrP").GetDouble(), c.GetProperty("likelihoodRatio").GetProperty("pValue").GetDouble(), 1e-7, "LR p");
            Close(e.GetProperty("marginal").GetProperty("lower").GetDouble(), c.GetProperty("marginalRiskDifference").GetProperty("lower").GetDouble(), 1e-7, "marginal lower");
        }
        Close(expected.GetProperty("treatmentLr").GetProperty("p").GetDouble(), result.GetProperty("treatmentLikelihoodRatio").GetProperty("pValue").GetDouble(), 1e-7, "term LR p");
    }

    [Fact]
    public void Logistic_with_a_bad_response_value_names_the_file_line_and_variable_with_exit_code_2()
    {
        using var folder = new TempFolder();
        var file = folder.Write("bad.csv", "RESP,ARM\n1,A\n0,B\n2,A\n1,B\n");
        var (code, output, error) = Run("logistic", "--data", file, "--response", "RESP", "--treatment", "ARM", "--control", "A");
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Equal("", output);
        var line = Assert.Single(error.Trim().Split('\n'));
        Assert.Contains("bad.csv", line, StringComparison.Ordinal);
        Assert.Contains("4", line, StringComparison.Ordinal);
        Assert.Contains("RESP", line, StringComparison.Ordinal);
        Assert.Contains("expected 1 or 0", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_mistyped_variable_or_control_is_a_usage_error_naming_the_nearest_name()
    {
        using var folder = new TempFolder();
        var file = DemoCsv(folder);
        var (code, _, error) = Run("logistic", "--data", file, "--response", "RESPX", "--treatment", "TRT01P", "--control", "Placebo");
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Contains("--response:", error, StringComparison.Ordinal);
        Assert.Contains("did you mean 'RESP'", error, StringComparison.Ordinal);
        (code, _, error) = Run("logistic", "--data", file, "--response", "RESP", "--treatment", "TRT01P", "--control", "Placebos");
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Contains("--control:", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Mmrm_from_a_csv_gives_the_kenward_roger_differences_of_R()
    {
        var result = Json("mmrm", "--data", Path.Combine(Oracles, "mmrm_data.csv"), "--subject", "USUBJID", "--visit", "AVISIT",
            "--visits", "W04,W08,W12,W16", "--response", "CHG", "--treatment", "ARM", "--control", "PBO", "--factors", "STRAT", "--covariates", "BASE");
        var expected = Oracle("mmrm_oracles.json").GetProperty("study").GetProperty("UN");
        Assert.Equal("unstructured", result.GetProperty("covariance").GetString());
        Assert.Equal("yes", result.GetProperty("converged").GetString());
        Close(-2 * expected.GetProperty("logLik").GetDouble(), result.GetProperty("minus2LogRestrictedLikelihood").GetDouble(), 1e-9, "-2 log restricted likelihood");
        var differences = result.GetProperty("differencesFromControl").EnumerateArray().ToList();
        var reference = expected.GetProperty("differencesByVisit").EnumerateArray().Append(expected.GetProperty("differencesOverall")[0]).ToList();
        Assert.Equal(5, differences.Count);
        for (var k = 0; k < 5; k++)
        {
            var label = reference[k].GetProperty("label").GetString()!;
            Assert.EndsWith(k < 4 ? differences[k].GetProperty("visit").GetString()! : "PBO", label, StringComparison.Ordinal);
            Close(reference[k].GetProperty("estimate").GetDouble(), differences[k].GetProperty("estimate").GetDouble(), 1e-6, label + " estimate");
            Close(reference[k].GetProperty("krSe").GetDouble(), differences[k].GetProperty("standardError").GetDouble(), 1e-6, label + " Kenward-Roger SE");
            Close(reference[k].GetProperty("krDf").GetDouble(), differences[k].GetProperty("df").GetDouble(), 1e-5, label + " Kenward-Roger df");
        }
    }

    [Fact]
    public void Mmrm_with_text_visits_and_no_order_says_which_order_it_used()
    {
        var result = Json("mmrm", "--data", Path.Combine(Oracles, "mmrm_data.csv"), "--subject", "USUBJID", "--visit", "AVISIT",
            "--response", "CHG", "--treatment", "ARM", "--control", "PBO", "--covariance", "compound-symmetry", "--df", "satterthwaite");
        Assert.Contains("visits in the order first seen in the file: W04, W08, W12, W16", result.GetProperty("note").GetString(), StringComparison.Ordinal);
        Assert.Equal("satterthwaite", result.GetProperty("degreesOfFreedom").GetString());
    }

    [Fact]
    public void Noninferiority_from_counts_matches_the_farrington_manning_reference_and_states_the_conclusion()
    {
        var expected = Oracle("adjusted_logistic_oracles.json").GetProperty("farringtonManning")[3];
        Assert.Equal("lower", expected.GetProperty("direction").GetString());
        var result = Json("noninferiority", "--events1", "12", "--n1", "120", "--events2", "9", "--n2", "118", "--margin", "0.08",
            "--alpha", "0.025", "--direction", "lower-is-better");
        Close(expected.GetProperty("z").GetDouble(), result.GetProperty("test").GetProperty("statistic").GetDouble(), 1e-7, "Z");
        Close(expected.GetProperty("p").GetDouble(), result.GetProperty("test").GetProperty("pValue").GetDouble(), 1e-8, "p");
        Close(expected.GetProperty("upper").GetDouble(), result.GetProperty("difference").GetProperty("upper").GetDouble(), 1e-8, "upper");
        Assert.Equal(expected.GetProperty("shown").GetBoolean() ? "non-inferiority shown" : "non-inferiority not shown", result.GetProperty("conclusion").GetString());
    }

    [Fact]
    public void Noninferiority_of_a_continuous_difference_and_its_bad_inputs()
    {
        var result = Json("noninferiority", "--estimate", "-0.5", "--standard-error", "0.6", "--df", "40", "--margin", "2");
        Assert.Equal("non-inferiority shown", result.GetProperty("conclusion").GetString());
        Assert.Equal(-2, result.GetProperty("nullDifference").GetDouble());
        Assert.Equal(ExitCodes.Usage, Run("noninferiority", "--events1", "3", "--n1", "10", "--estimate", "1", "--standard-error", "1", "--margin", "0.1").Code);
        Assert.Equal(ExitCodes.Usage, Run("noninferiority", "--events1", "3", "--n1", "10", "--events2", "3", "--n2", "10", "--margin", "0.1", "--alpha", "0.5").Code);
        Assert.Equal(ExitCodes.Usage, Run("noninferiority", "--events1", "3", "--n1", "10", "--events2", "3", "--margin", "0.1").Code);
        Assert.Equal(ExitCodes.Usage, Run("noninferiority", "--estimate", "1", "--standard-error", "1", "--margin", "1", "--hypothesis", "equivalence").Code);
    }
}
