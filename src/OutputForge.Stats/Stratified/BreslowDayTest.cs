using MathNet.Numerics;

namespace OutputForge.Stats.Stratified;

/// <summary>
/// The Breslow-Day test of homogeneity of the odds ratios of a 2 x 2 x K table (Breslow and Day 1980,
/// Statistical Methods in Cancer Research vol. I, section 4.4), with Tarone's (1985, Biometrika
/// 72:91-95) correction by default.
/// For each stratum the expected count A_k of cell (1, 1) under the common Mantel-Haenszel odds ratio
/// psi solves A (n2 - m1 + A) = psi (n1 - A)(m1 - A) within [max(0, m1 - n2), min(n1, m1)], and
/// V_k = 1 / (1/A + 1/(n1 - A) + 1/(m1 - A) + 1/(n2 - m1 + A)). Then
/// X^2_BD = sum (a_k - A_k)^2 / V_k, and Tarone's statistic subtracts (sum a_k - sum A_k)^2 / sum V_k;
/// the reference distribution is chi-square with (number of contributing strata - 1) degrees of freedom.
/// Strata without subjects in a group are skipped and returned as stratum remarks; so are strata with a zero margin
/// (no events, or all events), whose conditional distribution is degenerate (V_k = 0). Not estimable
/// when fewer than two strata contribute or the common odds ratio is 0 or infinite.
/// </summary>
public static class BreslowDayTest
{
    public const string MethodName = "Breslow-Day test";
    public const string TaroneMethodName = "Breslow-Day test with Tarone's correction";

    public static TestResult Compute(IReadOnlyList<StratumCounts> strata, bool taroneCorrection = true)
    {
        string method = taroneCorrection ? TaroneMethodName : MethodName;
        var (used, remarks) = StrataSelection.Select(strata);
        var common = MantelHaenszelOddsRatio.Compute(used);
        if (!common.IsEstimable || common.Estimate <= 0 || double.IsInfinity(common.Estimate))
        {
            return TestResult.NotEstimable(method, $"the common odds ratio is not estimable ({common.NotEstimableReason})") with { StratumRemarks = remarks };
        }
        double psi = common.Estimate;
        double statistic = 0, observedSum = 0, expectedSum = 0, varianceSum = 0;
        int contributing = 0;
        for (int k = 0; k < used.Count; k++)
        {
            var s = used[k];
            int m1 = s.EventTotal;
            if (m1 == 0 || m1 == s.N)
            {
                // Only this test leaves such a stratum out (the common estimates keep it), so the remark names the test.
                remarks.Add(new StratumRemark(Index(strata, s), m1 == 0 ? StratumRemarkReason.NoEvents : StratumRemarkReason.AllEvents, MethodName));
                continue;
            }
            double expected = ExpectedCell(psi, s.Total1, s.Total2, m1);
            double variance = 1 / (1 / expected + 1 / (s.Total1 - expected) + 1 / (m1 - expected) + 1 / (s.Total2 - m1 + expected));
            statistic += (s.A - expected) * (s.A - expected) / variance;
            observedSum += s.A;
            expectedSum += expected;
            varianceSum += variance;
            contributing++;
        }
        if (contributing < 2)
        {
            return TestResult.NotEstimable(method, "fewer than two strata have events and non-events") with { StratumRemarks = remarks };
        }
        if (taroneCorrection)
        {
            statistic -= (observedSum - expectedSum) * (observedSum - expectedSum) / varianceSum;
        }
        int df = contributing - 1;
        double p = SpecialFunctions.GammaUpperRegularized(df / 2.0, Math.Max(0, statistic) / 2);
        return new TestResult(method, statistic, df, p) { StratumRemarks = remarks };
    }

    /// <summary>
    /// The root in (max(0, m1 - n2), min(n1, m1)) of (1 - psi) A^2 + (n2 - m1 + psi (n1 + m1)) A - psi n1 m1 = 0.
    /// </summary>
    internal static double ExpectedCell(double psi, int n1, int n2, int m1)
    {
        double low = Math.Max(0, m1 - n2);
        double high = Math.Min(n1, m1);
        double a = 1 - psi;
        double b = n2 - m1 + psi * (n1 + m1);
        double c = -psi * n1 * (double)m1;
        if (Math.Abs(a) < 1e-12)
        {
            return -c / b;
        }
        // Numerically stable roots (Press et al., Numerical Recipes, section 5.6).
        double q = -0.5 * (b + Math.Sign(b) * Math.Sqrt(Math.Max(0, b * b - 4 * a * c)));
        double first = q / a;
        double second = c / q;
        return first > low - 1e-9 && first < high + 1e-9 ? first : second;
    }

    /// <summary>The caller's index of a stratum kept by the selection (the same instance).</summary>
    private static int Index(IReadOnlyList<StratumCounts> strata, StratumCounts stratum)
    {
        for (int k = 0; k < strata.Count; k++)
        {
            if (ReferenceEquals(strata[k], stratum))
            {
                return k;
            }
        }
        throw new InvalidOperationException("a selected stratum is not one of the input strata");
    }
}
