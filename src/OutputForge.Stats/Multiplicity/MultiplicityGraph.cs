namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// The graph of Bretz, Maurer, Brannath and Posch (2009, Statistics in Medicine 28:586-604, section 2): one node per
/// hypothesis with its initial weight w_i (the share of alpha it is tested at), and a transition matrix G whose entry
/// g_ij is the share of H_i's level passed to H_j once H_i is rejected. Valid when every weight and every g_ij lies in
/// [0, 1], the weights sum to at most 1, each row of G sums to at most 1 and the diagonal is 0 (their conditions on the
/// graph, section 2).
/// </summary>
public sealed class MultiplicityGraph
{
    public MultiplicityGraph(IReadOnlyList<double> weights, IReadOnlyList<IReadOnlyList<double>> transitions)
    {
        ArgumentNullException.ThrowIfNull(weights);
        ArgumentNullException.ThrowIfNull(transitions);
        var m = weights.Count;
        if (m == 0)
        {
            throw new ArgumentException("a graph needs at least one hypothesis", nameof(weights));
        }
        MultiplicityInput.Weights(weights, m);
        if (transitions.Count != m)
        {
            throw new ArgumentException($"the transition matrix has {transitions.Count} rows for {m} hypotheses; it must be {m} x {m}", nameof(transitions));
        }
        for (var i = 0; i < m; i++)
        {
            var row = transitions[i];
            if (row.Count != m)
            {
                throw new ArgumentException($"row {i + 1} of the transition matrix has {row.Count} entries; it must have {m}", nameof(transitions));
            }
            for (var j = 0; j < m; j++)
            {
                if (!(row[j] >= 0 && row[j] <= 1))
                {
                    throw new ArgumentException(MultiplicityInput.Text($"transition matrix entry ({i + 1}, {j + 1}) is {row[j]}; an entry must lie between 0 and 1"), nameof(transitions));
                }
            }
            if (row[i] != 0)
            {
                throw new ArgumentException(MultiplicityInput.Text($"transition matrix entry ({i + 1}, {i + 1}) is {row[i]}; the diagonal must be 0 (a hypothesis passes nothing to itself)"), nameof(transitions));
            }
            var sum = row.Sum();
            if (sum > 1 + MultiplicityInput.SumTolerance)
            {
                throw new ArgumentException(MultiplicityInput.Text($"row {i + 1} of the transition matrix sums to {sum}; each row must sum to at most 1"), nameof(transitions));
            }
        }
        Weights = weights.ToArray();
        Transitions = transitions.Select(r => (IReadOnlyList<double>)r.ToArray()).ToArray();
    }

    public IReadOnlyList<double> Weights { get; }
    public IReadOnlyList<IReadOnlyList<double>> Transitions { get; }
    public int Count => Weights.Count;

    /// <summary>Holm (1979) as a graph: weights 1/m, g_ij = 1/(m - 1) (Bretz et al. 2009, section 3).</summary>
    public static MultiplicityGraph Holm(int m) => new(
        Enumerable.Repeat(1.0 / m, m).ToArray(),
        Enumerable.Range(0, m).Select(i => (IReadOnlyList<double>)Enumerable.Range(0, m).Select(j => i == j ? 0 : 1.0 / (m - 1)).ToArray()).ToArray());

    /// <summary>
    /// The fixed sequence as a graph: all weight on the first hypothesis, g_{i,i+1} = 1 (Bretz et al. 2009, section 3).
    /// </summary>
    public static MultiplicityGraph FixedSequence(int m) => Chain(Enumerable.Range(0, m).Select(i => i == 0 ? 1.0 : 0).ToArray());

    /// <summary>
    /// The fallback procedure of Wiens (2003) as a graph: weights w_i, g_{i,i+1} = 1, the last hypothesis passing nothing
    /// on (Bretz et al. 2009, section 3, where the improved fallback procedures add edges back from the last node).
    /// </summary>
    public static MultiplicityGraph Fallback(IReadOnlyList<double> weights) => Chain(weights);

    private static MultiplicityGraph Chain(IReadOnlyList<double> weights)
    {
        var m = weights.Count;
        return new MultiplicityGraph(weights,
            Enumerable.Range(0, m).Select(i => (IReadOnlyList<double>)Enumerable.Range(0, m).Select(j => j == i + 1 ? 1.0 : 0).ToArray()).ToArray());
    }
}
