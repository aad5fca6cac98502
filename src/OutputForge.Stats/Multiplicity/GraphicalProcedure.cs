namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// The sequentially rejective graphical procedure of Bretz, Maurer, Brannath and Posch (2009, Statistics in Medicine
/// 28:586-604). Rejecting H_j removes its node and passes its weight along its edges:
/// w_l &lt;- w_l + w_j g_jl, and g_lk &lt;- (g_lk + g_lj g_jk) / (1 - g_lj g_jl) for the remaining l != k (0 where
/// g_lj g_jl = 1): their Algorithm 1. The adjusted p-values come from their companion algorithm (section 3): at each
/// step the remaining hypothesis with the smallest p_j / w_j is removed, its adjusted p-value the largest of p_j / w_j
/// and the adjusted p-values before it, capped at 1. The result of Algorithm 1 does not depend on the order in which
/// rejectable hypotheses are taken (their Theorem 1), so H_j is rejected at level alpha exactly when its adjusted
/// p-value is at most alpha.
/// </summary>
public static class GraphicalProcedure
{
    /// <summary>Adjusted p-values and decisions at level <paramref name="alpha"/>, the order of rejection being the order of the steps.</summary>
    public static MultiplicityResult Adjust(MultiplicityGraph graph, IReadOnlyList<double> pValues, double alpha,
        MultiplicityProcedure procedure = MultiplicityProcedure.Graphical)
    {
        ArgumentNullException.ThrowIfNull(graph);
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        CheckCount(graph, pValues);
        var state = new GraphState(graph);
        var adjusted = new double[pValues.Count];
        var steps = new List<int>();
        var largest = 0.0;
        while (state.Remaining.Count > 0)
        {
            // The smallest p_j / w_j; a node of weight 0 cannot be rejected yet (ratio infinite). Ties go to the first listed.
            var j = state.Remaining.MinBy(i => (Ratio(pValues[i], state.Weights[i]), i));
            largest = Math.Max(largest, Math.Min(1, Ratio(pValues[j], state.Weights[j])));
            adjusted[j] = largest;
            steps.Add(j);
            state.Reject(j);
        }
        return MultiplicityDecisions.FromSteps(procedure, alpha, pValues, adjusted, steps);
    }

    /// <summary>
    /// Algorithm 1 of Bretz et al. (2009) at level <paramref name="alpha"/>: the hypotheses it rejects, in the order it
    /// rejects them (at each step the first listed hypothesis with p_j &lt;= w_j alpha).
    /// </summary>
    public static IReadOnlyList<int> Reject(MultiplicityGraph graph, IReadOnlyList<double> pValues, double alpha)
    {
        ArgumentNullException.ThrowIfNull(graph);
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        CheckCount(graph, pValues);
        var state = new GraphState(graph);
        var rejected = new List<int>();
        while (state.Remaining.FirstOrDefault(i => pValues[i] <= state.Weights[i] * alpha, -1) is var j && j >= 0)
        {
            rejected.Add(j);
            state.Reject(j);
        }
        return rejected;
    }

    private static double Ratio(double p, double weight) => weight > 0 ? p / weight : double.PositiveInfinity;

    private static void CheckCount(MultiplicityGraph graph, IReadOnlyList<double> pValues)
    {
        if (graph.Count != pValues.Count)
        {
            throw new ArgumentException($"{pValues.Count} p-values for a graph of {graph.Count} hypotheses; give one p-value per hypothesis", nameof(pValues));
        }
    }

    /// <summary>The current weights and transitions while hypotheses are removed (the update of Algorithm 1, step 2).</summary>
    private sealed class GraphState
    {
        private readonly double[,] _g;

        public GraphState(MultiplicityGraph graph)
        {
            var m = graph.Count;
            Weights = graph.Weights.ToArray();
            _g = new double[m, m];
            for (var i = 0; i < m; i++)
            {
                for (var k = 0; k < m; k++)
                {
                    _g[i, k] = graph.Transitions[i][k];
                }
            }
            Remaining = Enumerable.Range(0, m).ToList();
        }

        public double[] Weights { get; }
        public List<int> Remaining { get; }

        public void Reject(int j)
        {
            Remaining.Remove(j);
            var next = new double[_g.GetLength(0), _g.GetLength(1)];
            foreach (var l in Remaining)
            {
                Weights[l] += Weights[j] * _g[j, l];
                foreach (var k in Remaining)
                {
                    var loop = _g[l, j] * _g[j, l];
                    next[l, k] = l != k && loop < 1 ? (_g[l, k] + _g[l, j] * _g[j, k]) / (1 - loop) : 0;
                }
            }
            Weights[j] = 0;
            Array.Copy(next, _g, next.Length);
        }
    }
}
