using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Compares Kaplan-Meier, log-rank and Cox results with one block of efficacy_oracles.json written by
/// generate_efficacy_oracles.R from R 4.2.2 survival 3.5.3 (survfit conf.type = "log-log",
/// quantile, summary(times =), survdiff, coxph with ties = "efron" / "breslow").
/// </summary>
internal static class SurvivalReference
{
    public const double Agreement = 1e-9;

    public sealed record Subjects(SurvivalData Data, IReadOnlyList<string> Arm, IReadOnlyList<string>? Stratum);

    public static Subjects FromRows(IEnumerable<Dictionary<string, string>> rows, string armColumn, string? stratumColumn)
    {
        var list = rows.ToList();
        return new Subjects(
            new SurvivalData(list.Select(r => EfficacyOracles.Number(r["AVAL"])).ToList(), list.Select(r => r["CNSR"] == "0").ToList()),
            list.Select(r => r[armColumn]).ToList(),
            stratumColumn is null ? null : list.Select(r => r[stratumColumn]).ToList());
    }

    public static void CheckKaplanMeier(Subjects subjects, string arm, JsonElement expected)
    {
        var rows = Enumerable.Range(0, subjects.Data.Count).Where(i => subjects.Arm[i] == arm).ToList();
        var curve = KaplanMeierEstimate.Compute(subjects.Data.Subset(rows));
        Assert.Equal(expected.GetProperty("n").GetDouble(), curve.Count);
        Assert.Equal(expected.GetProperty("events").GetDouble(), curve.EventCount);
        var median = curve.Median();
        Assert.Equal(EfficacyOracles.Get(expected, "median"), median.Estimate);
        Assert.Equal(EfficacyOracles.Get(expected, "medianLower"), median.Lower);
        Assert.Equal(EfficacyOracles.Get(expected, "medianUpper"), median.Upper);
        var times = expected.GetProperty("times").EnumerateArray().Select(e => e.GetDouble()).ToList();
        string[] names = ["surv", "lower", "upper", "stdErr"];
        var columns = names.Select(n => expected.GetProperty(n).EnumerateArray().Select(e => e.GetDouble()).ToList()).ToList();
        for (var k = 0; k < times.Count; k++)
        {
            var at = curve.At(times[k]);
            Assert.True(at.IsEstimable, at.NotEstimableReason);
            EfficacyOracles.Close(columns[0][k], at.Estimate, Agreement, $"{arm} S({times[k]})");
            EfficacyOracles.Close(columns[1][k], at.Lower, Agreement, $"{arm} lower({times[k]})");
            EfficacyOracles.Close(columns[2][k], at.Upper, Agreement, $"{arm} upper({times[k]})");
            var step = curve.Steps.Last(s => s.Time <= times[k]);
            // R's summary() std.err is the standard error of S itself (Greenwood).
            EfficacyOracles.Close(columns[3][k], Math.Sqrt(step.GreenwoodVariance), Agreement, $"{arm} Greenwood SE({times[k]})");
        }
    }

    public static void CheckLogRank(Subjects subjects, IReadOnlyList<string> arms, bool stratified, JsonElement expected)
    {
        var rows = Enumerable.Range(0, subjects.Data.Count).Where(i => arms.Contains(subjects.Arm[i])).ToList();
        var group = rows.Select(i => arms.ToList().IndexOf(subjects.Arm[i])).ToList();
        var strata = stratified ? Codes(rows.Select(i => subjects.Stratum![i]).ToList()) : null;
        var test = LogRankTest.Compute(subjects.Data.Subset(rows), group, strata);
        Assert.True(test.IsEstimable, test.NotEstimableReason);
        EfficacyOracles.Close(expected.GetProperty("chisq").GetDouble(), test.Statistic!.Value, Agreement, "log-rank chi-square");
        Assert.Equal(expected.GetProperty("df").GetDouble(), test.DegreesOfFreedom);
        EfficacyOracles.Close(expected.GetProperty("p").GetDouble(), test.PValue, 1e-8, "log-rank p");
    }

    public static void CheckCox(Subjects subjects, string active, string control, CoxTies ties, bool stratified, JsonElement expected)
    {
        var rows = Enumerable.Range(0, subjects.Data.Count).Where(i => subjects.Arm[i] == active || subjects.Arm[i] == control).ToList();
        var x = new double[rows.Count, 1];
        for (var k = 0; k < rows.Count; k++)
        {
            x[k, 0] = subjects.Arm[rows[k]] == active ? 1 : 0;
        }
        var strata = stratified ? Codes(rows.Select(i => subjects.Stratum![i]).ToList()) : null;
        var fit = CoxProportionalHazards.Fit(subjects.Data.Subset(rows), x, ties, strata);
        Assert.True(fit.IsEstimable, fit.NotEstimableReason);
        // R's coxph was run with eps = 1e-12, so both sides are at the maximum to about 1e-10.
        const double cox = 1e-8;
        EfficacyOracles.Close(expected.GetProperty("coef").GetDouble(), fit.Coefficients[0], cox, $"{ties} coefficient");
        EfficacyOracles.Close(expected.GetProperty("se").GetDouble(), fit.StandardError(0), cox, $"{ties} SE");
        EfficacyOracles.Close(expected.GetProperty("loglik").GetDouble(), fit.LogLikelihood, 1e-12, $"{ties} log likelihood");
        var hr = fit.HazardRatio(0, 0.95);
        EfficacyOracles.Close(expected.GetProperty("hr").GetDouble(), hr.Estimate, cox, $"{ties} hazard ratio");
        EfficacyOracles.Close(expected.GetProperty("lower").GetDouble(), hr.Lower, cox, $"{ties} HR lower");
        EfficacyOracles.Close(expected.GetProperty("upper").GetDouble(), hr.Upper, cox, $"{ties} HR upper");
    }

    private static List<int> Codes(List<string> values)
    {
        var levels = values.Distinct().Order(StringComparer.Ordinal).ToList();
        return values.Select(v => levels.IndexOf(v)).ToList();
    }
}
