using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Survival;

/// <summary>
/// The log-rank test of equal survival in k groups (Mantel, Cancer Chemotherapy Reports 50, 1966;
/// Peto and Peto, JRSS A 135, 1972), optionally stratified: observed minus expected events and their
/// hypergeometric covariance are summed over strata, and U' V^- U on k - 1 degrees of freedom is
/// referred to the chi-square distribution, as R survival's survdiff computes it.
/// </summary>
public static class LogRankTest
{
    public const string Method = "log-rank test";
    public const string StratifiedMethod = "stratified log-rank test";

    /// <param name="data">The observations' times and event flags.</param>
    /// <param name="group">Group index (0..k-1) of each observation.</param>
    /// <param name="stratum">Stratum index of each observation, or null for an unstratified test.</param>
    /// <remarks>A stratum with one group only, or without events, adds nothing to the test; it is reported in
    /// <see cref="TestResult.StratumRemarks"/> by its index, for the caller to name.</remarks>
    public static TestResult Compute(SurvivalData data, IReadOnlyList<int> group, IReadOnlyList<int>? stratum = null)
    {
        var method = stratum is null ? Method : StratifiedMethod;
        if (group.Count != data.Count || (stratum is not null && stratum.Count != data.Count))
        {
            throw new ArgumentException("one group (and stratum) index is needed per observation");
        }
        var groups = group.Distinct().Order().ToList();
        if (groups.Count < 2)
        {
            return TestResult.NotEstimable(method, "fewer than two groups have subjects");
        }
        var k = groups.Count;
        var indexOf = groups.Select((g, i) => (g, i)).ToDictionary(p => p.g, p => p.i);
        var observedMinusExpected = new double[k];
        var variance = new double[k, k];
        var remarks = new List<StratumRemark>();
        var strata = Enumerable.Range(0, data.Count).GroupBy(i => stratum?[i] ?? 0).OrderBy(g => g.Key);
        foreach (var rows in strata)
        {
            var groupsHere = rows.Select(i => group[i]).Distinct().Count();
            var eventsHere = rows.Count(i => data.Events[i]);
            if (stratum is not null && (groupsHere < 2 || eventsHere == 0))
            {
                remarks.Add(new StratumRemark(rows.Key, groupsHere < 2 ? StratumRemarkReason.OneGroupOnly : StratumRemarkReason.NoEvents));
            }
            AddStratum(data, rows.ToList(), group, indexOf, observedMinusExpected, variance);
        }
        var u = Vector<double>.Build.Dense(k - 1, i => observedMinusExpected[i]);
        var v = Matrix<double>.Build.Dense(k - 1, k - 1, (i, j) => variance[i, j]);
        if (v.Rank() < k - 1)
        {
            return TestResult.NotEstimable(method, "the variance of observed minus expected events is singular (no events, or a group with no subjects at risk at any event time)") with { StratumRemarks = remarks };
        }
        var statistic = u.DotProduct(v.Solve(u));
        var df = k - 1;
        // Upper tail through the regularized incomplete gamma function, which stays accurate for tiny p.
        var p = MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(df / 2.0, statistic / 2.0);
        return new TestResult(method, statistic, df, p) { StratumRemarks = remarks };
    }

    /// <summary>Adds one stratum's O - E and hypergeometric covariance at each distinct event time.</summary>
    private static void AddStratum(SurvivalData data, List<int> rows, IReadOnlyList<int> group, Dictionary<int, int> indexOf,
        double[] observedMinusExpected, double[,] variance)
    {
        var k = observedMinusExpected.Length;
        var atRisk = new double[k];
        foreach (var i in rows)
        {
            atRisk[indexOf[group[i]]]++;
        }
        foreach (var atTime in rows.GroupBy(i => data.Times[i]).OrderBy(g => g.Key))
        {
            var n = atRisk.Sum();
            var deaths = new double[k];
            foreach (var i in atTime.Where(i => data.Events[i]))
            {
                deaths[indexOf[group[i]]]++;
            }
            var d = deaths.Sum();
            if (d > 0)
            {
                for (var g = 0; g < k; g++)
                {
                    observedMinusExpected[g] += deaths[g] - d * atRisk[g] / n;
                }
                if (n > 1)
                {
                    var factor = d * (n - d) / (n - 1) / n;
                    for (var g = 0; g < k; g++)
                    {
                        for (var h = 0; h < k; h++)
                        {
                            variance[g, h] += factor * atRisk[g] * ((g == h ? 1 : 0) - atRisk[h] / n);
                        }
                    }
                }
            }
            foreach (var i in atTime)
            {
                atRisk[indexOf[group[i]]]--;
            }
        }
    }
}
