using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.Proportions;

/// <summary>
/// Non-inferiority and superiority of a continuous difference (e.g. an LS-mean difference, arm minus control) against a
/// margin, from its estimate and standard error: the two-sided 100(1 - 2 alpha)% interval estimate -/+ t SE, t the
/// upper alpha point of Student's t with the analysis' degrees of freedom (the normal when none are given), and the
/// one-sided test T = (estimate - delta0) / SE on the same distribution, so that the one-sided test at alpha and the
/// interval's bound against the margin agree by construction.
/// </summary>
public static class ContinuousMarginComparison
{
    public const string MethodName = "One-sided test of the difference against the margin";

    public static MarginComparison Compute(double estimate, double standardError, double? degreesOfFreedom, double margin, double alpha,
        MarginHypothesis hypothesis = MarginHypothesis.NonInferiority, MarginDirection direction = MarginDirection.HigherIsBetter)
    {
        MarginComparison.ValidateAlpha(alpha);
        var delta0 = MarginComparison.NullValue(margin, hypothesis, direction);
        if (!double.IsFinite(estimate) || !(standardError > 0) || !double.IsFinite(standardError) || degreesOfFreedom is { } d && !(d > 0))
        {
            const string reason = "the difference has no finite estimate, positive standard error and positive degrees of freedom";
            return new MarginComparison(hypothesis, direction, margin, delta0, alpha, TestResult.NotEstimable(MethodName, reason),
                IntervalResult.NotEstimable(reason), false, MarginConclusion.NotEstimable);
        }
        var statistic = (estimate - delta0) / standardError;
        double Cdf(double v) => degreesOfFreedom is { } df ? StudentT.CDF(0, 1, df, v) : Normal.CDF(0, 1, v);
        var quantile = degreesOfFreedom is { } f ? StudentT.InvCDF(0, 1, f, 1 - alpha) : Normal.InvCDF(0, 1, 1 - alpha);
        var p = direction == MarginDirection.HigherIsBetter ? Cdf(-statistic) : Cdf(statistic);
        var interval = new IntervalResult(estimate, estimate - quantile * standardError, estimate + quantile * standardError);
        var excludes = MarginComparison.Excludes(interval, delta0, direction);
        return new MarginComparison(hypothesis, direction, margin, delta0, alpha, new TestResult(MethodName, statistic, degreesOfFreedom, p),
            interval, excludes, p < alpha ? MarginConclusion.Shown : MarginConclusion.NotShown);
    }
}
