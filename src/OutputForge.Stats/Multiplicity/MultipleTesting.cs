namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// One entry point for every procedure of <see cref="MultiplicityProcedure"/>. Weights are needed by the weighted
/// Bonferroni test, the fallback procedure (Wiens 2003: w_i alpha for H_i in the order listed, the level of a rejected
/// hypothesis passed to the next, the graph of Bretz et al. 2009, section 3) and the graphical approach, which also
/// needs the transition matrix; the other procedures take none.
/// </summary>
public static class MultipleTesting
{
    public static MultiplicityResult Adjust(MultiplicityProcedure procedure, IReadOnlyList<double> pValues, double alpha,
        IReadOnlyList<double>? weights = null, IReadOnlyList<IReadOnlyList<double>>? transitions = null)
    {
        ArgumentNullException.ThrowIfNull(pValues);
        var needsWeights = procedure is MultiplicityProcedure.WeightedBonferroni or MultiplicityProcedure.Fallback or MultiplicityProcedure.Graphical;
        if (needsWeights && weights is null)
        {
            throw new ArgumentException($"the {Name(procedure)} procedure needs weights, one per hypothesis", nameof(weights));
        }
        if (!needsWeights && weights is not null)
        {
            throw new ArgumentException($"the {Name(procedure)} procedure takes no weights", nameof(weights));
        }
        if ((procedure == MultiplicityProcedure.Graphical) != (transitions is not null))
        {
            throw new ArgumentException(transitions is null
                ? "the graphical procedure needs a transition matrix"
                : $"the {Name(procedure)} procedure takes no transition matrix", nameof(transitions));
        }
        return procedure switch
        {
            MultiplicityProcedure.Bonferroni => BonferroniAdjustment.Adjust(pValues, alpha),
            MultiplicityProcedure.Holm => HolmAdjustment.Adjust(pValues, alpha),
            MultiplicityProcedure.Hochberg => HochbergAdjustment.Adjust(pValues, alpha),
            MultiplicityProcedure.Hommel => HommelAdjustment.Adjust(pValues, alpha),
            MultiplicityProcedure.FixedSequence => FixedSequenceAdjustment.Adjust(pValues, alpha),
            MultiplicityProcedure.WeightedBonferroni => BonferroniAdjustment.AdjustWeighted(pValues, weights!, alpha),
            MultiplicityProcedure.Fallback => Fallback(pValues, weights!, alpha),
            MultiplicityProcedure.Graphical => GraphicalProcedure.Adjust(Graph(weights!, transitions!, pValues.Count), pValues, alpha),
            _ => throw new ArgumentOutOfRangeException(nameof(procedure), procedure, "unknown procedure"),
        };
    }

    private static MultiplicityResult Fallback(IReadOnlyList<double> pValues, IReadOnlyList<double> weights, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Weights(weights, pValues.Count);
        return GraphicalProcedure.Adjust(MultiplicityGraph.Fallback(weights), pValues, alpha, MultiplicityProcedure.Fallback);
    }

    private static MultiplicityGraph Graph(IReadOnlyList<double> weights, IReadOnlyList<IReadOnlyList<double>> transitions, int hypotheses)
    {
        MultiplicityInput.Weights(weights, hypotheses);
        return new MultiplicityGraph(weights, transitions);
    }

    private static string Name(MultiplicityProcedure procedure) => procedure switch
    {
        MultiplicityProcedure.WeightedBonferroni => "weighted Bonferroni",
        MultiplicityProcedure.FixedSequence => "fixed-sequence",
        _ => procedure.ToString().ToLowerInvariant(),
    };
}
