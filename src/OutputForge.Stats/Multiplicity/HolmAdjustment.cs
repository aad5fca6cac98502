namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Holm (1979, Scandinavian Journal of Statistics 6:65-70) step-down procedure. With p_(1) &lt;= ... &lt;= p_(m), the
/// adjusted p-value of the k-th smallest is max over j &lt;= k of min(1, (m - j + 1) p_(j)); the procedure rejects
/// H_(1), H_(2), ... while p_(k) &lt;= alpha / (m - k + 1).
/// </summary>
public static class HolmAdjustment
{
    public static MultiplicityResult Adjust(IReadOnlyList<double> pValues, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        var m = pValues.Count;
        var steps = MultiplicityDecisions.ByRawP(pValues);
        var adjusted = new double[m];
        var largest = 0.0;
        for (var k = 0; k < m; k++)
        {
            largest = Math.Max(largest, Math.Min(1, (m - k) * pValues[steps[k]]));
            adjusted[steps[k]] = largest;
        }
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.Holm, alpha, pValues, adjusted, steps);
    }
}
