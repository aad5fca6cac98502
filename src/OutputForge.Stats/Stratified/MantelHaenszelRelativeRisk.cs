namespace OutputForge.Stats.Stratified;

/// <summary>
/// The Mantel-Haenszel common relative risk (group 1 to group 2; Rothman, Greenland and Lash 2008,
/// Modern Epidemiology 3rd ed., chapter 15), RR_MH = sum (a_k n2k / N_k) / sum (c_k n1k / N_k), with
/// the confidence interval exp(ln RR_MH -/+ z sqrt(v)) and the variance of Greenland and Robins (1985,
/// Biometrics 41:55-68): v = sum ((n1k n2k m1k - a_k c_k N_k) / N_k^2) /
/// ((sum a_k n2k / N_k)(sum c_k n1k / N_k)), m1k = a_k + c_k.
/// Not estimable when either sum is zero. Strata without subjects in a group are skipped and returned as stratum remarks.
/// </summary>
public static class MantelHaenszelRelativeRisk
{
    public static IntervalResult Compute(IReadOnlyList<StratumCounts> strata, double level = 0.95)
    {
        ConfidenceLevel.Validate(level);
        var (used, remarks) = StrataSelection.Select(strata);
        if (used.Count == 0)
        {
            return IntervalResult.NotEstimable("no stratum has subjects in both groups") with { StratumRemarks = remarks };
        }
        double numerator = 0, denominator = 0, varianceNumerator = 0;
        foreach (var k in used)
        {
            double n = k.N;
            numerator += k.A * (double)k.Total2 / n;
            denominator += k.C * (double)k.Total1 / n;
            varianceNumerator += (k.Total1 * (double)k.Total2 * k.EventTotal - k.A * (double)k.C * n) / (n * n);
        }
        if (numerator == 0 || denominator == 0)
        {
            return IntervalResult.NotEstimable(numerator == 0
                ? "no events in group 1 in any stratum, so the common relative risk is 0 and its log is undefined"
                : "no events in group 2 in any stratum, so the common relative risk is infinite") with { StratumRemarks = remarks };
        }
        double estimate = numerator / denominator;
        double variance = varianceNumerator / (numerator * denominator);
        double half = ConfidenceLevel.NormalQuantile(level) * Math.Sqrt(Math.Max(0, variance));
        return new IntervalResult(estimate, Math.Exp(Math.Log(estimate) - half), Math.Exp(Math.Log(estimate) + half)) { StratumRemarks = remarks };
    }
}
