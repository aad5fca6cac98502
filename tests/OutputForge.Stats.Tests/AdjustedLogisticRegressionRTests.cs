using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The covariate-adjusted logistic regression against Oracles/adjusted_logistic_oracles.json, written by
/// Oracles/generate_adjusted_logistic_oracles.R (R 4.2.2: glm and anova for maximum likelihood; profile limits,
/// likelihood-ratio tests and Firth's penalized likelihood written there from Firth 1993 and Heinze and Schemper 2002,
/// Firth's estimates cross-checked there with brglm2 0.9; the marginal risk difference's gradient by numDeriv
/// 2016.8-1.1). Data: the invented demo study's Week 12 itch responders (records in the JSON), the CDISC pilot ADSL read
/// from ../shared, and an invented separated data set (records in the JSON).
/// </summary>
public sealed class AdjustedLogisticRegressionRTests
{
    private const string PilotFile = "data/cdiscpilot01/csv/adsl.csv";

    private static readonly JsonElement Oracle = JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "adjusted_logistic_oracles.json"))).RootElement;

    private static double[] Numbers(JsonElement e) => e.EnumerateArray().Select(v => v.GetDouble()).ToArray();

    private static string[] Texts(JsonElement e) => e.EnumerateArray().Select(v => v.GetString()!).ToArray();

    private static LinearModelFactor Factor(string name, IReadOnlyList<string> values, IReadOnlyList<string> levels) =>
        new(name, levels, values.Select(v => levels.ToList().IndexOf(v)).ToList());

    private static LogisticAnalysisData DemoData()
    {
        var r = Oracle.GetProperty("demo").GetProperty("records");
        return new LogisticAnalysisData(Numbers(r.GetProperty("y")).Select(v => (int)v).ToList(),
            Factor("TRT01P", Texts(r.GetProperty("TRT01P")), Texts(r.GetProperty("treatmentLevels"))),
            [Factor("STRAT1R", Texts(r.GetProperty("STRAT1R")), Texts(r.GetProperty("STRAT1RLevels"))),
             Factor("STRAT2R", Texts(r.GetProperty("STRAT2R")), Texts(r.GetProperty("STRAT2RLevels")))],
            [new LinearModelCovariate("ITCHBL", Numbers(r.GetProperty("ITCHBL")))]);
    }

    private static LogisticAnalysisData SeparatedData()
    {
        var r = Oracle.GetProperty("separated").GetProperty("records");
        return new LogisticAnalysisData(Numbers(r.GetProperty("y")).Select(v => (int)v).ToList(),
            Factor("ARM", Texts(r.GetProperty("ARM")), ["PBO", "ACT"]),
            [Factor("STRAT", Texts(r.GetProperty("STRAT")), ["A", "B"])],
            [new LinearModelCovariate("BASE", Numbers(r.GetProperty("BASE")))]);
    }

    /// <summary>The pilot ADSL (ITT): completion of Week 24 by arm (in TRT01PN order), age, pooled site and sex.</summary>
    private static LogisticAnalysisData PilotData()
    {
        var rows = EfficacyOracles.ReadCsvFile(SharedFile.Find(PilotFile)!).Where(r => r["ITTFL"] == "Y").ToList();
        var arms = rows.OrderBy(r => double.Parse(r["TRT01PN"], System.Globalization.CultureInfo.InvariantCulture)).Select(r => r["TRT01P"]).Distinct().ToList();
        List<string> Sorted(string name) => rows.Select(r => r[name]).Distinct().Order(StringComparer.Ordinal).ToList();
        return new LogisticAnalysisData(rows.Select(r => r["COMP24FL"] == "Y" ? 1 : 0).ToList(),
            Factor("TRT01P", rows.Select(r => r["TRT01P"]).ToList(), arms),
            [Factor("SITEGR1", rows.Select(r => r["SITEGR1"]).ToList(), Sorted("SITEGR1")), Factor("SEX", rows.Select(r => r["SEX"]).ToList(), Sorted("SEX"))],
            [new LinearModelCovariate("AGE", rows.Select(r => double.Parse(r["AGE"], System.Globalization.CultureInfo.InvariantCulture)).ToList())]);
    }

    private static void Close(double expected, double actual, double relative, string what) =>
        Assert.True(Math.Abs(expected - actual) <= relative * Math.Max(1, Math.Abs(expected)), $"{what}: R {expected:R}, ours {actual:R}");

    /// <summary>Every number of one analysis against the oracle's: coefficients and SEs 1e-8, deviance 1e-10, intervals and tests 1e-7.</summary>
    private static void Same(JsonElement expected, AdjustedLogisticResult result, string what)
    {
        Assert.True(result.IsEstimable, result.NotEstimableReason);
        var columns = Texts(expected.GetProperty("columns"));
        Assert.Equal(columns, result.Coefficients.Select(c => c.Name.Replace("[", "", StringComparison.Ordinal).Replace("]", "", StringComparison.Ordinal)).ToArray());
        var coefficients = Numbers(expected.GetProperty("coefficients"));
        var errors = Numbers(expected.GetProperty("standardErrors"));
        var waldP = Numbers(expected.GetProperty("waldP"));
        for (var j = 0; j < columns.Length; j++)
        {
            Close(coefficients[j], result.Coefficients[j].Estimate, 1e-8, $"{what} coefficient {columns[j]}");
            Close(errors[j], result.Coefficients[j].StandardError, 1e-8, $"{what} SE {columns[j]}");
            Close(waldP[j], result.Coefficients[j].WaldPValue, 1e-7, $"{what} Wald p {columns[j]}");
        }
        Close(expected.GetProperty("deviance").GetDouble(), result.Deviance, 1e-10, $"{what} deviance");
        foreach (var (name, test) in new[] { ("treatmentLr", result.TreatmentLikelihoodRatioTest), ("treatmentWald", result.TreatmentWaldTest) })
        {
            var e = expected.GetProperty(name);
            Assert.True(test.IsEstimable, test.NotEstimableReason);
            Close(e.GetProperty("statistic").GetDouble(), test.Statistic!.Value, 1e-7, $"{what} {name} statistic");
            Assert.Equal(e.GetProperty("df").GetDouble(), test.DegreesOfFreedom);
            Close(e.GetProperty("p").GetDouble(), test.PValue, 1e-7, $"{what} {name} p");
        }
        var comparisons = expected.GetProperty("comparisons").EnumerateArray().ToList();
        Assert.Equal(comparisons.Count, result.Comparisons.Count);
        for (var k = 0; k < comparisons.Count; k++)
        {
            var e = comparisons[k];
            var c = result.Comparisons[k];
            var label = $"{what} {e.GetProperty("column").GetString()}";
            Close(e.GetProperty("oddsRatio").GetDouble(), c.OddsRatioWald.Estimate, 1e-8, label + " odds ratio");
            Close(e.GetProperty("waldLower").GetDouble(), c.OddsRatioWald.Lower, 1e-8, label + " Wald lower");
            Close(e.GetProperty("waldUpper").GetDouble(), c.OddsRatioWald.Upper, 1e-8, label + " Wald upper");
            Assert.True(c.OddsRatioProfile.IsEstimable, c.OddsRatioProfile.NotEstimableReason);
            Close(e.GetProperty("profileLower").GetDouble(), c.OddsRatioProfile.Lower, 1e-7, label + " profile lower");
            Close(e.GetProperty("profileUpper").GetDouble(), c.OddsRatioProfile.Upper, 1e-7, label + " profile upper");
            Close(e.GetProperty("waldP").GetDouble(), c.WaldTest.PValue, 1e-7, label + " Wald p");
            Close(e.GetProperty("lrStatistic").GetDouble(), c.LikelihoodRatioTest.Statistic!.Value, 1e-7, label + " LR statistic");
            Close(e.GetProperty("lrP").GetDouble(), c.LikelihoodRatioTest.PValue, 1e-7, label + " LR p");
            var m = e.GetProperty("marginal");
            Close(m.GetProperty("riskArm").GetDouble(), c.StandardizedRiskArm, 1e-8, label + " standardized risk of the arm");
            Close(m.GetProperty("riskControl").GetDouble(), c.StandardizedRiskControl, 1e-8, label + " standardized risk of the control");
            Close(m.GetProperty("estimate").GetDouble(), c.MarginalRiskDifference.Estimate, 1e-8, label + " marginal risk difference");
            Close(m.GetProperty("lower").GetDouble(), c.MarginalRiskDifference.Lower, 1e-7, label + " marginal lower");
            Close(m.GetProperty("upper").GetDouble(), c.MarginalRiskDifference.Upper, 1e-7, label + " marginal upper");
        }
    }

    [Fact]
    public void The_demo_responder_model_matches_R_glm_and_the_profile_written_in_R()
    {
        var result = AdjustedLogisticRegression.Analyze(DemoData());
        Assert.False(result.FirthUsed);
        Assert.Empty(result.Notes);
        Assert.Equal(Oracle.GetProperty("demo").GetProperty("iterations").GetInt32(), result.Iterations);
        Same(Oracle.GetProperty("demo"), result, "demo");
    }

    [Fact]
    public void Firth_on_the_demo_model_matches_the_penalized_likelihood_written_in_R_and_brglm2()
    {
        var result = AdjustedLogisticRegression.Analyze(DemoData(), LogisticEstimation.Firth);
        var expected = Oracle.GetProperty("demoFirth");
        Assert.True(result.FirthUsed);
        Assert.Equal(LogisticNoteKind.FirthRequested, Assert.Single(result.Notes).Kind);
        Same(expected, result, "demo Firth");
        Close(expected.GetProperty("penalizedLogLikelihood").GetDouble(), result.PenalizedLogLikelihood!.Value, 1e-10, "penalized log-likelihood");
        var brglm2 = Numbers(expected.GetProperty("brglm2Coefficients"));
        for (var j = 0; j < brglm2.Length; j++)
        {
            Close(brglm2[j], result.Coefficients[j].Estimate, 1e-8, $"brglm2 0.9 coefficient {j}");
        }
    }

    [SharedFileFact(PilotFile)]
    public void The_pilot_completion_model_matches_R_glm_and_the_profile_written_in_R()
    {
        var data = PilotData();
        var expected = Oracle.GetProperty("pilot");
        Assert.Equal(expected.GetProperty("records").GetInt32(), data.Count);
        Assert.Equal(Texts(expected.GetProperty("treatmentLevels")), data.Treatment.Levels);
        var result = AdjustedLogisticRegression.Analyze(data);
        Assert.False(result.FirthUsed);
        Assert.Equal(expected.GetProperty("iterations").GetInt32(), result.Iterations);
        Same(expected, result, "pilot");
    }

    [Fact]
    public void Separation_switches_to_Firth_with_a_structured_note_and_matches_R()
    {
        var expected = Oracle.GetProperty("separated");
        // R's glm converges here without a warning (the oracle's glmWarnings), yet every subject of the active arm responds.
        Assert.Equal(0, expected.GetProperty("glmWarnings").GetArrayLength());
        var result = AdjustedLogisticRegression.Analyze(SeparatedData());
        Assert.Equal(Separation.QuasiComplete, result.Separation);
        Assert.True(result.FirthUsed);
        var note = Assert.Single(result.Notes);
        Assert.Equal(LogisticNoteKind.SeparationFirthUsed, note.Kind);
        Assert.Contains("quasi-complete separation", note.Text, StringComparison.Ordinal);
        Same(expected, result, "separated");
        Close(expected.GetProperty("penalizedLogLikelihood").GetDouble(), result.PenalizedLogLikelihood!.Value, 1e-10, "penalized log-likelihood");
    }

    [Fact]
    public void Complete_separation_by_a_covariate_gets_finite_Firth_estimates_and_profile_limits_as_in_R()
    {
        var r = Oracle.GetProperty("complete").GetProperty("records");
        var data = new LogisticAnalysisData(Numbers(r.GetProperty("y")).Select(v => (int)v).ToList(),
            Factor("ARM", Texts(r.GetProperty("ARM")), ["PBO", "ACT"]), [], [new LinearModelCovariate("BASE", Numbers(r.GetProperty("BASE")))]);
        var result = AdjustedLogisticRegression.Analyze(data);
        Assert.Equal(Separation.Complete, result.Separation);
        Assert.True(result.FirthUsed);
        Assert.Contains("complete separation", Assert.Single(result.Notes).Text, StringComparison.Ordinal);
        Same(Oracle.GetProperty("complete"), result, "complete");
    }

    [Fact]
    public void Separation_without_Firth_is_not_estimable_and_says_why()
    {
        var result = AdjustedLogisticRegression.Analyze(SeparatedData(), LogisticEstimation.MaximumLikelihood);
        Assert.False(result.IsEstimable);
        Assert.Contains("quasi-complete separation", result.NotEstimableReason, StringComparison.Ordinal);
        Assert.False(result.TreatmentLikelihoodRatioTest.IsEstimable);
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void A_coefficient_held_far_out_gives_a_fit_or_a_non_converged_one_never_an_exception(bool penalized)
    {
        var data = SeparatedData();
        var design = LinearModelDesign.Build(data.Count, data.Covariates, [data.Treatment, .. data.Factors]);
        var y = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense(data.Count, i => data.Response[i]);
        foreach (var held in new[] { -800.0, 800.0 })
        {
            var fit = LogisticNewtonFit.Fit(design.Matrix, y, penalized, [null, null, held, null]);
            Assert.True(!fit.Converged || double.IsFinite(fit.Objective), $"held at {held}: converged with objective {fit.Objective}");
            Assert.Equal(held, fit.Beta[2]);
        }
    }

    [Fact]
    public void A_treatment_with_an_empty_arm_is_not_estimable_not_a_crash()
    {
        var data = DemoData();
        var treatment = data.Treatment with { Levels = [.. data.Treatment.Levels, "Unused"] };
        var result = AdjustedLogisticRegression.Analyze(data with { Treatment = treatment });
        Assert.False(result.IsEstimable);
        Assert.Contains("TRT01P[Unused]", result.NotEstimableReason, StringComparison.Ordinal);
    }
}
