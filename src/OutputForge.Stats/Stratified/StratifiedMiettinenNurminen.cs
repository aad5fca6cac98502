using OutputForge.Stats.Proportions;

namespace OutputForge.Stats.Stratified;

/// <summary>
/// The stratified Miettinen-Nurminen score interval for a common risk difference p1 - p2 over K strata
/// (Miettinen and Nurminen 1985, Stat Med 4:213-226, section on stratified data), with the
/// Cochran-Mantel-Haenszel-type weights w_k = n1k n2k / (n1k + n2k).
/// For a hypothesised common difference delta, each stratum has its maximum likelihood estimates
/// (p1k~, p2k~) restricted to p1k~ - p2k~ = delta (the same closed-form cubic root as the unstratified
/// interval, <see cref="MiettinenNurminenScore.RestrictedEstimates"/>), and
/// Z(delta) = sum w_k (d_k - delta) / sqrt( sum w_k^2 V_k~ ),
/// V_k~ = (p1k~ q1k~ / n1k + p2k~ q2k~ / n2k) N_k / (N_k - 1), d_k = y1k / n1k - y2k / n2k.
/// The limits solve Z(delta) = +z (lower) and -z (upper), found by bisection on [-1, estimate] and
/// [estimate, 1], as for one stratum.
/// Point estimate: the root of the score, Z(delta) = 0. Because the weights do not depend on delta,
/// that root is exactly the weighted difference sum w_k d_k / sum w_k, so the two choices coincide; it
/// also equals the Mantel-Haenszel risk difference, whose weights are the same.
/// With K = 1 the statistic is the unstratified Miettinen-Nurminen statistic, so the interval is the
/// unstratified one. Strata with no subjects in a group carry no information and are skipped, each
/// returned in <see cref="IntervalResult.StratumRemarks"/>; when no stratum is left the result is not estimable.
/// </summary>
public static class StratifiedMiettinenNurminen
{
    public const string MethodName = "stratified Miettinen-Nurminen score";

    private const int BisectionSteps = 200;

    public static IntervalResult Compute(IReadOnlyList<StratumCounts> strata, double level = 0.95)
    {
        ConfidenceLevel.Validate(level);
        var (used, remarks) = StrataSelection.Select(strata);
        var notes = new List<string>();
        if (used.Count == 0)
        {
            return IntervalResult.NotEstimable("no stratum has subjects in both groups") with { StratumRemarks = remarks };
        }
        double weighted = 0, weights = 0;
        foreach (var k in used)
        {
            double w = Weight(k);
            weighted += w * ((double)k.Events1 / k.Total1 - (double)k.Events2 / k.Total2);
            weights += w;
        }
        double estimate = Math.Clamp(weighted / weights, -1, 1);
        double z = ConfidenceLevel.NormalQuantile(level);
        double lower = Solve(-1, estimate, z, used);
        double upper = Solve(estimate, 1, -z, used);
        if (lower == upper)
        {
            notes.Add("The interval has zero width.");
        }
        return new IntervalResult(estimate, lower, upper) { Notes = notes, StratumRemarks = remarks };
    }

    /// <summary>Z(delta) over the strata that have subjects in both groups; +/- infinity where the restricted variance vanishes.</summary>
    internal static double Statistic(double delta, IReadOnlyList<StratumCounts> strata)
    {
        var (used, _) = StrataSelection.Select(strata);
        return StatisticOver(delta, used);
    }

    private static double Weight(StratumCounts k) => k.Total1 * (double)k.Total2 / k.N;

    private static double StatisticOver(double delta, IReadOnlyList<StratumCounts> used)
    {
        double numerator = 0, variance = 0;
        foreach (var k in used)
        {
            double w = Weight(k);
            numerator += w * ((double)k.Events1 / k.Total1 - (double)k.Events2 / k.Total2 - delta);
            var (r1, r2) = MiettinenNurminenScore.RestrictedEstimates(delta, k.Events1, k.Total1, k.Events2, k.Total2);
            variance += w * w * (r1 * (1 - r1) / k.Total1 + r2 * (1 - r2) / k.Total2) * k.N / (k.N - 1.0);
        }
        if (numerator == 0)
        {
            return 0;
        }
        if (variance <= 0)
        {
            return numerator > 0 ? double.PositiveInfinity : double.NegativeInfinity;
        }
        return numerator / Math.Sqrt(variance);
    }

    /// <summary>
    /// Bisection for Z(delta) = target on [left, right] with Z decreasing; when the target is not crossed
    /// inside the bracket the limit is the end of the parameter space (as for one stratum).
    /// </summary>
    private static double Solve(double left, double right, double target, IReadOnlyList<StratumCounts> used)
    {
        bool forLower = target > 0;
        double outer = forLower ? left : right;
        double atOuter = StatisticOver(outer, used);
        if (forLower ? atOuter <= target : atOuter >= target)
        {
            return outer;
        }
        double a = left;
        double b = right;
        for (int step = 0; step < BisectionSteps && b - a > 1e-15; step++)
        {
            double mid = 0.5 * (a + b);
            if (StatisticOver(mid, used) > target)
            {
                a = mid;
            }
            else
            {
                b = mid;
            }
        }
        return 0.5 * (a + b);
    }
}
