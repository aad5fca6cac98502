using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.Proportions;

/// <summary>
/// Non-inferiority and superiority of a difference of two proportions against a margin (arm = group 1, control =
/// group 2). The test is the score test of Farrington and Manning (1990, Stat Med 9:1447-1454) of
/// H0: p1 - p2 = delta0 against the one-sided alternative on the better side:
/// Z = (p1^ - p2^ - delta0) / sqrt(p1~ q1~ / n1 + p2~ q2~ / n2), with p1~ - p2~ = delta0 the maximum-likelihood
/// estimates restricted to the null (the closed-form root of the cubic, shared with
/// <see cref="MiettinenNurminenScore"/>); p = 1 - Phi(Z) when higher is better, Phi(Z) when lower is better. The
/// interval is the Miettinen-Nurminen (1985) score interval at the two-sided level 1 - 2 alpha (its variance carries the
/// factor N / (N - 1), Farrington and Manning's does not, so near the boundary the two can disagree: a note then says
/// so). The conclusion follows the test.
/// </summary>
public static class FarringtonManningTest
{
    public const string MethodName = "Farrington-Manning score test";

    public static MarginComparison Compute(int events1, int n1, int events2, int n2, double margin, double alpha,
        MarginHypothesis hypothesis = MarginHypothesis.NonInferiority, MarginDirection direction = MarginDirection.HigherIsBetter)
    {
        TwoGroupCounts.Validate(events1, n1, events2, n2);
        MarginComparison.ValidateAlpha(alpha);
        var delta0 = MarginComparison.NullValue(margin, hypothesis, direction);
        if (Math.Abs(delta0) >= 1)
        {
            throw new ArgumentOutOfRangeException(nameof(margin), margin, "A margin for a difference of proportions must be below 1.");
        }
        if (n1 == 0 || n2 == 0)
        {
            var reason = TwoGroupCounts.EmptyGroupReason(n1, n2);
            return new MarginComparison(hypothesis, direction, margin, delta0, alpha, TestResult.NotEstimable(MethodName, reason),
                IntervalResult.NotEstimable(reason), false, MarginConclusion.NotEstimable);
        }
        var z = Statistic(delta0, events1, n1, events2, n2);
        var p = direction == MarginDirection.HigherIsBetter ? Normal.CDF(0, 1, -z) : Normal.CDF(0, 1, z);
        var test = new TestResult(MethodName, z, null, p);
        var interval = ProportionDifferenceInterval.Compute(events1, n1, events2, n2, DifferenceCiMethod.MiettinenNurminen, 1 - 2 * alpha);
        var excludes = MarginComparison.Excludes(interval, delta0, direction);
        var shown = p < alpha;
        var notes = new List<string>();
        if (shown != excludes)
        {
            notes.Add(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"the Farrington-Manning test {(shown ? "rejects" : "does not reject")} the null difference {delta0:R} but the Miettinen-Nurminen interval {(excludes ? "excludes" : "includes")} it (the interval's variance has the factor N/(N - 1))"));
        }
        return new MarginComparison(hypothesis, direction, margin, delta0, alpha, test, interval, excludes,
            shown ? MarginConclusion.Shown : MarginConclusion.NotShown) { Notes = notes };
    }

    /// <summary>
    /// Z(delta0) of Farrington and Manning (1990, equation 2 with the restricted estimates of their section 2);
    /// +/- infinity when the restricted variance is 0 with a non-zero numerator.
    /// </summary>
    public static double Statistic(double delta0, int events1, int n1, int events2, int n2)
    {
        var numerator = (double)events1 / n1 - (double)events2 / n2 - delta0;
        if (numerator == 0)
        {
            return 0;
        }
        var (r1, r2) = MiettinenNurminenScore.RestrictedEstimates(delta0, events1, n1, events2, n2);
        var variance = r1 * (1 - r1) / n1 + r2 * (1 - r2) / n2;
        return variance > 0 ? numerator / Math.Sqrt(variance) : numerator > 0 ? double.PositiveInfinity : double.NegativeInfinity;
    }
}
