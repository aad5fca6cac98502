namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Hochberg (1988, Biometrika 75:800-802) step-up procedure. With p_(1) &lt;= ... &lt;= p_(m), the adjusted p-value of
/// the k-th smallest is min over j &gt;= k of min(1, (m - j + 1) p_(j)): starting from the largest p-value, the first
/// k with p_(k) &lt;= alpha / (m - k + 1) rejects H_(1), ..., H_(k). Valid under independence or positive dependence
/// of the tests (Sarkar 1998), not in general.
/// </summary>
public static class HochbergAdjustment
{
    public static MultiplicityResult Adjust(IReadOnlyList<double> pValues, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        var m = pValues.Count;
        var steps = MultiplicityDecisions.ByRawP(pValues);
        var adjusted = new double[m];
        var smallest = 1.0;
        for (var k = m - 1; k >= 0; k--)
        {
            smallest = Math.Min(smallest, (m - k) * pValues[steps[k]]);
            adjusted[steps[k]] = smallest;
        }
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.Hochberg, alpha, pValues, adjusted, steps);
    }
}
