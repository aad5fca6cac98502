namespace OutputForge.Stats.Stratified;

/// <summary>
/// The Mantel-Haenszel common risk difference p1 - p2 (Greenland and Robins 1985, Biometrics
/// 41:55-68), RD_MH = sum w_k (p1k - p2k) / sum w_k with w_k = n1k n2k / N_k, and the confidence
/// interval RD_MH -/+ z sqrt(v) with the variance of Sato (1989, Biometrics 45:1323-1324), which is
/// consistent both for many sparse strata and for few large ones:
/// v = (RD_MH sum P_k + sum Q_k) / (sum w_k)^2, P_k = (n1k^2 y2k - n2k^2 y1k + n1k n2k (n2k - n1k) / 2) / N_k^2,
/// Q_k = (y1k (n2k - y2k) + y2k (n1k - y1k)) / (2 N_k), y the events.
/// Limits beyond [-1, 1] are truncated and noted. Strata without subjects in a group are skipped and
/// returned as stratum remarks.
/// </summary>
public static class MantelHaenszelRiskDifference
{
    public static IntervalResult Compute(IReadOnlyList<StratumCounts> strata, double level = 0.95)
    {
        ConfidenceLevel.Validate(level);
        var (used, remarks) = StrataSelection.Select(strata);
        var notes = new List<string>();
        if (used.Count == 0)
        {
            return IntervalResult.NotEstimable("no stratum has subjects in both groups") with { StratumRemarks = remarks };
        }
        double weighted = 0, weights = 0, sumP = 0, sumQ = 0;
        foreach (var k in used)
        {
            double n = k.N, n1 = k.Total1, n2 = k.Total2, y1 = k.Events1, y2 = k.Events2;
            double w = n1 * n2 / n;
            weighted += w * (y1 / n1 - y2 / n2);
            weights += w;
            sumP += (n1 * n1 * y2 - n2 * n2 * y1 + n1 * n2 * (n2 - n1) / 2) / (n * n);
            sumQ += (y1 * (n2 - y2) + y2 * (n1 - y1)) / (2 * n);
        }
        double estimate = weighted / weights;
        double variance = Math.Max(0, (estimate * sumP + sumQ) / (weights * weights));
        double half = ConfidenceLevel.NormalQuantile(level) * Math.Sqrt(variance);
        double lower = estimate - half;
        double upper = estimate + half;
        if (lower < -1)
        {
            notes.Add("The lower limit was truncated to -1.");
            lower = -1;
        }
        if (upper > 1)
        {
            notes.Add("The upper limit was truncated to 1.");
            upper = 1;
        }
        if (variance == 0)
        {
            notes.Add("The variance is zero (every stratum has both groups at 0% or at 100%), so the interval has zero width.");
        }
        return new IntervalResult(estimate, lower, upper) { Notes = notes, StratumRemarks = remarks };
    }
}
