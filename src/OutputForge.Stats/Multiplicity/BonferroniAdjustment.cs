namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Single-step Bonferroni adjustments. Unweighted: p~_i = min(1, m p_i). Weighted: H_i is tested at w_i alpha with
/// sum w_i &lt;= 1, so p~_i = min(1, p_i / w_i), and 1 where w_i = 0 (a hypothesis given no level is never rejected)
/// (Bonferroni inequality; weighted form as in Bretz et al. 2009, section 2, a graph without edges).
/// </summary>
public static class BonferroniAdjustment
{
    public static MultiplicityResult Adjust(IReadOnlyList<double> pValues, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        var m = pValues.Count;
        var adjusted = pValues.Select(p => Math.Min(1, m * p)).ToArray();
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.Bonferroni, alpha, pValues, adjusted, MultiplicityDecisions.ByRawP(pValues));
    }

    public static MultiplicityResult AdjustWeighted(IReadOnlyList<double> pValues, IReadOnlyList<double> weights, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        MultiplicityInput.Weights(weights, pValues.Count);
        var adjusted = pValues.Select((p, i) => weights[i] > 0 ? Math.Min(1, p / weights[i]) : 1).ToArray();
        var steps = Enumerable.Range(0, pValues.Count).OrderBy(i => adjusted[i]).ThenBy(i => i).ToList();
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.WeightedBonferroni, alpha, pValues, adjusted, steps);
    }
}
