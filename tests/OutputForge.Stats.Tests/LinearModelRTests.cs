using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The ANCOVA of Oracles/efficacy_lm_data.csv (invented, drawn by generate_efficacy_oracles.R) against
/// R 4.2.2 lm(Y ~ ARM + BASE + STRAT + REGION) with LS means computed by hand from coef() and vcov()
/// in that script (BASE at its mean, STRAT and REGION levels weighted equally), and the dose-response
/// slope against lm(Y ~ DOSE + BASE + STRAT + REGION).
/// </summary>
public sealed class LinearModelRTests
{
    private const double Agreement = 1e-10;
    private static readonly JsonElement Reference = EfficacyOracles.Root.GetProperty("linearModel");

    private static (LinearModelFit Fit, LinearModelFactor Arm) FitAncova(bool doseAsNumber = false)
    {
        var rows = EfficacyOracles.ReadCsv("efficacy_lm_data.csv");
        var arm = Factor("ARM", ["P", "L", "H"], rows);
        var covariates = new List<LinearModelCovariate>();
        if (doseAsNumber)
        {
            covariates.Add(new LinearModelCovariate("DOSE", rows.Select(r => EfficacyOracles.Number(r["DOSE"])).ToList()));
        }
        covariates.Add(new LinearModelCovariate("BASE", rows.Select(r => EfficacyOracles.Number(r["BASE"])).ToList()));
        var factors = new List<LinearModelFactor>();
        if (!doseAsNumber)
        {
            factors.Add(arm);
        }
        factors.Add(Factor("STRAT", ["MOD", "SEV"], rows));
        factors.Add(Factor("REGION", ["EU", "AM", "AP"], rows));
        var design = LinearModelDesign.Build(rows.Count, covariates, factors);
        return (LinearModel.Fit(rows.Select(r => EfficacyOracles.Number(r["Y"])).ToList(), design), arm);
    }

    private static LinearModelFactor Factor(string name, string[] levels, List<Dictionary<string, string>> rows) =>
        new(name, levels, rows.Select(r => Array.IndexOf(levels, r[name])).ToList());

    private static void Same(JsonElement expected, LinearContrastResult actual, string what)
    {
        EfficacyOracles.Close(expected.GetProperty("estimate").GetDouble(), actual.Estimate, Agreement, what + " estimate");
        EfficacyOracles.Close(expected.GetProperty("se").GetDouble(), actual.StandardError, Agreement, what + " SE");
        EfficacyOracles.Close(expected.GetProperty("p").GetDouble(), actual.PValue, 1e-8, what + " p");
        if (expected.TryGetProperty("lower", out var lower))
        {
            EfficacyOracles.Close(lower.GetDouble(), actual.Lower, Agreement, what + " lower");
            EfficacyOracles.Close(expected.GetProperty("upper").GetDouble(), actual.Upper, Agreement, what + " upper");
        }
    }

    [Fact]
    public void Coefficients_and_standard_errors_match_lm()
    {
        var (fit, _) = FitAncova();
        var coefficients = Reference.GetProperty("coefficients").EnumerateArray().Select(e => e.GetDouble()).ToList();
        var errors = Reference.GetProperty("standardErrors").EnumerateArray().Select(e => e.GetDouble()).ToList();
        var names = Reference.GetProperty("coefficientNames").EnumerateArray().Select(e => e.GetString()!).ToList();
        Assert.Equal(coefficients.Count, fit.Coefficients.Count);
        for (var k = 0; k < coefficients.Count; k++)
        {
            // R names a class effect "ARML" where the design says "ARM[L]"; the column order differs too.
            var j = fit.Design.ColumnNames.Select(n => n.Replace("[", "").Replace("]", "")).ToList().IndexOf(names[k]);
            Assert.True(j >= 0, $"no column for {names[k]}");
            EfficacyOracles.Close(coefficients[k], fit.Coefficients[j], Agreement, names[k]);
            EfficacyOracles.Close(errors[k], fit.StandardError(j), Agreement, "SE of " + names[k]);
        }
        EfficacyOracles.Close(Reference.GetProperty("residualSd").GetDouble(), fit.ResidualStandardDeviation, Agreement, "sigma");
        Assert.Equal(Reference.GetProperty("df").GetDouble(), fit.ResidualDegreesOfFreedom);
    }

    [Fact]
    public void Least_squares_means_and_differences_match_the_hand_computation_from_lm()
    {
        var (fit, arm) = FitAncova();
        Same(Reference.GetProperty("lsmeanP"), LeastSquaresMeans.Mean(fit, arm, "P", 0.95), "LS mean P");
        Same(Reference.GetProperty("lsmeanL"), LeastSquaresMeans.Mean(fit, arm, "L", 0.95), "LS mean L");
        Same(Reference.GetProperty("lsmeanH"), LeastSquaresMeans.Mean(fit, arm, "H", 0.95), "LS mean H");
        Same(Reference.GetProperty("diffLvsP"), LeastSquaresMeans.Difference(fit, arm, "L", "P", 0.95), "L - P");
        Same(Reference.GetProperty("diffHvsP"), LeastSquaresMeans.Difference(fit, arm, "H", "P", 0.95), "H - P");
        Same(Reference.GetProperty("diffHvsL"), LeastSquaresMeans.Difference(fit, arm, "H", "L", 0.95), "H - L");
    }

    [Fact]
    public void Dose_response_slope_matches_lm_with_dose_as_a_number()
    {
        var (fit, _) = FitAncova(doseAsNumber: true);
        var slope = fit.Coefficient(1, 0.95);
        Same(Reference.GetProperty("doseSlope"), slope, "dose slope");
    }

    [Fact]
    public void An_empty_class_level_is_reported_not_estimated()
    {
        // Level "C" has no observations: its indicator column is zero, so the model is rank deficient.
        var factor = new LinearModelFactor("G", ["A", "B", "C"], [0, 0, 1, 1, 0, 1]);
        var design = LinearModelDesign.Build(6, [], [factor]);
        var fit = LinearModel.Fit([1.0, 2, 3, 4, 5, 6], design);
        Assert.False(fit.IsEstimable);
        Assert.Contains("G[C]", fit.NotEstimableReason);
    }

    [Fact]
    public void Too_few_observations_are_reported_not_estimated()
    {
        var design = LinearModelDesign.Build(2, [new LinearModelCovariate("x", [1.0, 2.0])], []);
        var fit = LinearModel.Fit([1.0, 3.0], design);
        Assert.False(fit.IsEstimable);
        Assert.Contains("no residual degrees of freedom", fit.NotEstimableReason);
    }
}
