namespace OutputForge.Stats.Stratified;

/// <summary>
/// The Mantel-Haenszel common odds ratio (Mantel and Haenszel 1959), OR_MH = sum R_k / sum S_k with
/// R_k = a_k d_k / N_k and S_k = b_k c_k / N_k, and the confidence interval exp(ln OR_MH -/+ z sqrt(v))
/// with the variance of Robins, Breslow and Greenland (1986, Biometrics 42:311-323):
/// v = sum P_k R_k / (2 R^2) + sum (P_k S_k + Q_k R_k) / (2 R S) + sum Q_k S_k / (2 S^2),
/// P_k = (a_k + d_k) / N_k, Q_k = (b_k + c_k) / N_k, R = sum R_k, S = sum S_k.
/// Not estimable when R = 0 or S = 0 (the estimate would be 0 or infinite). Strata without subjects in
/// a group are skipped and returned as stratum remarks.
/// </summary>
public static class MantelHaenszelOddsRatio
{
    public static IntervalResult Compute(IReadOnlyList<StratumCounts> strata, double level = 0.95)
    {
        ConfidenceLevel.Validate(level);
        var (used, remarks) = StrataSelection.Select(strata);
        if (used.Count == 0)
        {
            return IntervalResult.NotEstimable("no stratum has subjects in both groups") with { StratumRemarks = remarks };
        }
        double r = 0, s = 0, pr = 0, psqr = 0, qs = 0;
        foreach (var k in used)
        {
            double n = k.N;
            double rk = k.A * (double)k.D / n;
            double sk = k.B * (double)k.C / n;
            double pk = (k.A + k.D) / n;
            double qk = (k.B + k.C) / n;
            r += rk;
            s += sk;
            pr += pk * rk;
            psqr += pk * sk + qk * rk;
            qs += qk * sk;
        }
        if (r == 0 || s == 0)
        {
            return IntervalResult.NotEstimable(r == 0
                ? "the sum of a d / N over strata is zero, so the common odds ratio is 0 and its log is undefined"
                : "the sum of b c / N over strata is zero, so the common odds ratio is infinite") with { StratumRemarks = remarks };
        }
        double estimate = r / s;
        double variance = pr / (2 * r * r) + psqr / (2 * r * s) + qs / (2 * s * s);
        double half = ConfidenceLevel.NormalQuantile(level) * Math.Sqrt(variance);
        return new IntervalResult(estimate, Math.Exp(Math.Log(estimate) - half), Math.Exp(Math.Log(estimate) + half)) { StratumRemarks = remarks };
    }
}
