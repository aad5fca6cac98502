namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Hommel (1988, Biometrika 75:383-386): the closed test whose local test of an intersection of hypotheses I is the
/// Simes (1986) test, p_I = min over k of |I| p_(k:I) / k. The adjusted p-value of H_i is the largest p_I over the
/// sets I that contain i (closure principle, Marcus, Peritz and Gabriel 1976). The Simes p-value does not decrease
/// when any member's p-value grows, so among the sets of one size s containing i the largest is {i} with the s - 1
/// largest other p-values; the maximum is therefore taken over m sets, not 2^(m-1).
/// </summary>
public static class HommelAdjustment
{
    public static MultiplicityResult Adjust(IReadOnlyList<double> pValues, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        var m = pValues.Count;
        var adjusted = new double[m];
        for (var i = 0; i < m; i++)
        {
            var others = Enumerable.Range(0, m).Where(j => j != i).Select(j => pValues[j]).OrderDescending().ToArray();
            var largest = 0.0;
            for (var size = 1; size <= m; size++)
            {
                largest = Math.Max(largest, Simes([pValues[i], .. others.Take(size - 1)]));
            }
            adjusted[i] = Math.Min(1, largest);
        }
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.Hommel, alpha, pValues, adjusted, MultiplicityDecisions.ByRawP(pValues));
    }

    /// <summary>Simes (1986, Biometrika 73:751-754) p-value of the intersection of the given hypotheses.</summary>
    internal static double Simes(IReadOnlyList<double> pValues)
    {
        var sorted = pValues.Order().ToArray();
        var n = sorted.Length;
        return Enumerable.Range(1, n).Min(k => n * sorted[k - 1] / k);
    }
}
