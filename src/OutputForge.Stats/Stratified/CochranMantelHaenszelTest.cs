using MathNet.Numerics;

namespace OutputForge.Stats.Stratified;

/// <summary>
/// The Cochran-Mantel-Haenszel test of conditional independence in a 2 x 2 x K table (Cochran 1954,
/// Biometrics 10:417-451; Mantel and Haenszel 1959, J Natl Cancer Inst 22:719-748):
/// X^2 = (sum_k (a_k - E_k))^2 / sum_k V_k with E_k = n1k m1k / N_k and
/// V_k = n1k n2k m1k m2k / (N_k^2 (N_k - 1)), one degree of freedom.
/// With the continuity correction the numerator is (|sum (a_k - E_k)| - 1/2)^2, applied only when
/// |sum (a_k - E_k)| is at least 1/2, as in R's mantelhaen.test (otherwise the correction would
/// overshoot). Strata without subjects in a group are skipped and returned as stratum remarks (a stratum kept therefore
/// has N_k of at least 2, so its variance is defined).
/// </summary>
public static class CochranMantelHaenszelTest
{
    public const string MethodName = "Cochran-Mantel-Haenszel test";
    public const string CorrectedMethodName = "Cochran-Mantel-Haenszel test with continuity correction";

    public static TestResult Compute(IReadOnlyList<StratumCounts> strata, bool continuityCorrection = false)
    {
        string method = continuityCorrection ? CorrectedMethodName : MethodName;
        var (used, remarks) = StrataSelection.Select(strata);
        double deviation = 0;
        double variance = 0;
        int contributing = 0;
        foreach (var s in used)
        {
            double n = s.N;
            deviation += s.A - s.Total1 * (double)s.EventTotal / n;
            variance += s.Total1 * (double)s.Total2 * s.EventTotal * (n - s.EventTotal) / (n * n * (n - 1));
            contributing++;
        }
        if (contributing == 0)
        {
            return TestResult.NotEstimable(method, "no stratum has subjects in both groups") with { StratumRemarks = remarks };
        }
        if (variance <= 0)
        {
            return TestResult.NotEstimable(method, "every stratum has a zero margin (all or no subjects had the event), so the variance is zero") with { StratumRemarks = remarks };
        }
        double numerator = continuityCorrection && Math.Abs(deviation) >= 0.5 ? Math.Abs(deviation) - 0.5 : Math.Abs(deviation);
        double statistic = numerator * numerator / variance;
        double p = SpecialFunctions.GammaUpperRegularized(0.5, statistic / 2);
        return new TestResult(method, statistic, 1, p) { StratumRemarks = remarks };
    }
}
