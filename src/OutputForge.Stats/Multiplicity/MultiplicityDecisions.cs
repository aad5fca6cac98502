namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Turns adjusted p-values into decisions: a hypothesis is rejected when its adjusted p-value is at most alpha
/// (Wright 1992, the definition of an adjusted p-value), and the rejected ones are numbered in the order the
/// procedure's steps reach them.
/// </summary>
internal static class MultiplicityDecisions
{
    public static MultiplicityResult FromSteps(MultiplicityProcedure procedure, double alpha, IReadOnlyList<double> pValues,
        IReadOnlyList<double> adjusted, IReadOnlyList<int> steps)
    {
        var order = new int?[pValues.Count];
        var next = 1;
        foreach (var i in steps.Where(i => adjusted[i] <= alpha))
        {
            order[i] = next++;
        }
        return new MultiplicityResult(procedure, alpha,
            Enumerable.Range(0, pValues.Count).Select(i => new HypothesisDecision(i, pValues[i], adjusted[i], adjusted[i] <= alpha, order[i])).ToList());
    }

    /// <summary>The hypotheses by increasing raw p-value, ties in the order listed: the steps of Holm, Hochberg and Hommel.</summary>
    public static IReadOnlyList<int> ByRawP(IReadOnlyList<double> pValues) =>
        Enumerable.Range(0, pValues.Count).OrderBy(i => pValues[i]).ThenBy(i => i).ToList();
}
