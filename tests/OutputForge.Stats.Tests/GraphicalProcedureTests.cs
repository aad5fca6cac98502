namespace OutputForge.Stats.Tests;

/// <summary>
/// The graphical approach of Bretz, Maurer, Brannath and Posch (2009, Statistics in Medicine 28:586-604). No Debian
/// package implements it (r-cran-multcomp 1.4-22 has no graphical procedure; gMCP and graphicalMCP are not packaged),
/// so the checks are the paper's own statements (section 3: Holm, the fixed sequence and the fallback procedure are
/// graphs; Theorem 1: the rejections do not depend on the order of the steps) and examples worked by hand below.
/// </summary>
public sealed class GraphicalProcedureTests
{
    private static IReadOnlyList<double>[] Matrix(params double[][] rows) => rows.Select(r => (IReadOnlyList<double>)r).ToArray();

    /// <summary>
    /// Two doses, each with a primary (H1, H2) and a secondary hypothesis (H3, H4): weights (1/2, 1/2, 0, 0), each
    /// primary passes all to its secondary, each secondary to the other dose's primary. A graph of this form is drawn
    /// by Bretz et al. (2009, section 4, for two primary and two secondary hypotheses; the figure number is recalled
    /// from memory, so the numbers below are worked by hand and checked on their own).
    /// </summary>
    private static MultiplicityGraph TwoDosesTwoEndpoints() => new([0.5, 0.5, 0, 0], Matrix(
        [0, 0, 1, 0],
        [0, 0, 0, 1],
        [0, 1, 0, 0],
        [1, 0, 0, 0]));

    [Fact]
    public void Two_doses_two_endpoints_gives_the_hand_worked_adjusted_p_values()
    {
        // By hand with Algorithm 1's update (Bretz et al. 2009, section 3), p = (0.01, 0.03, 0.005, 0.5):
        // step 1: p/w = 0.02, 0.06, inf, inf -> H1 out, adjusted 0.02; w3 = 0.5; g43 = (0 + g41 g13) / (1 - g41 g14) = 1.
        // step 2: p/w = 0.06 (H2), 0.01 (H3) -> H3 out, adjusted max(0.02, 0.01) = 0.02; w2 = 1; g42 = 1.
        // step 3: H2 0.03 / 1 -> adjusted 0.03; w4 = 1.  step 4: H4 0.5 / 1 -> 0.5.
        var result = GraphicalProcedure.Adjust(TwoDosesTwoEndpoints(), [0.01, 0.03, 0.005, 0.5], 0.025);
        Assert.Equal([0.02, 0.03, 0.02, 0.5], result.Hypotheses.Select(h => Math.Round(h.AdjustedP, 14)));
        Assert.Equal([true, false, true, false], result.Hypotheses.Select(h => h.Rejected));
        Assert.Equal(new int?[] { 1, null, 2, null }, result.Hypotheses.Select(h => h.RejectionOrder));

        var at5 = GraphicalProcedure.Adjust(TwoDosesTwoEndpoints(), [0.01, 0.03, 0.005, 0.5], 0.05);
        Assert.Equal(new int?[] { 1, 3, 2, null }, at5.Hypotheses.Select(h => h.RejectionOrder));
        // Algorithm 1 itself at 0.05: H1 (0.01 <= 0.025), H3 (0.005 <= 0.025), then H2 with the full level (0.03 <= 0.05).
        Assert.Equal([0, 2, 1], GraphicalProcedure.Reject(TwoDosesTwoEndpoints(), [0.01, 0.03, 0.005, 0.5], 0.05));
    }

    [Fact]
    public void A_secondary_hypothesis_is_not_rejected_before_its_primary()
    {
        // Weight 0 on H3 until H1 is rejected: a tiny p3 alone rejects nothing (the gatekeeping the graph encodes).
        var result = GraphicalProcedure.Adjust(TwoDosesTwoEndpoints(), [0.2, 0.3, 0.0001, 0.0001], 0.05);
        Assert.All(result.Hypotheses, h => Assert.False(h.Rejected));
        // H3's adjusted p-value cannot be below its primary's (0.2 / 0.5 = 0.4).
        Assert.True(result.Hypotheses[2].AdjustedP >= result.Hypotheses[0].AdjustedP);
    }

    [Fact]
    public void Decisions_from_adjusted_p_values_equal_algorithm_one_in_any_order()
    {
        // Bretz et al. (2009), Theorem 1 and section 3: the set rejected by Algorithm 1 does not depend on which
        // rejectable hypothesis is taken first, and equals the set whose adjusted p-value is at most alpha.
        var random = new Random(20261204);
        for (var trial = 0; trial < 300; trial++)
        {
            var m = random.Next(2, 7);
            var graph = RandomGraph(random, m);
            var p = Enumerable.Range(0, m).Select(_ => Math.Pow(random.NextDouble(), 4)).ToArray();
            var alpha = 0.05;
            var adjusted = GraphicalProcedure.Adjust(graph, p, alpha);
            var rejected = GraphicalProcedure.Reject(graph, p, alpha).Order().ToArray();
            Assert.Equal(adjusted.Hypotheses.Where(h => h.Rejected).Select(h => h.Index).ToArray(), rejected);
            // The same graph with the hypotheses listed in reverse: the same decisions, mapped back.
            var reversed = Reverse(graph);
            var rejectedReversed = GraphicalProcedure.Reject(reversed, p.Reverse().ToArray(), alpha).Select(i => m - 1 - i).Order().ToArray();
            Assert.Equal(rejected, rejectedReversed);
        }
    }

    [Fact]
    public void Adjusted_p_values_equal_the_closed_test_of_weighted_Bonferroni_tests()
    {
        // Bretz et al. (2009), section 3: the graphical procedure is the closed test whose local test of an intersection
        // H_J is the weighted Bonferroni test with the weights w_j(J) the graph leaves on J after the hypotheses outside
        // J are removed by the update rule; so p~_i = max over J containing i of min(1, min over j in J of p_j / w_j(J)).
        // Every intersection is enumerated here, with the update rule written out again independently of the engine.
        var random = new Random(11);
        for (var trial = 0; trial < 200; trial++)
        {
            var m = random.Next(2, 6);
            var graph = RandomGraph(random, m);
            var p = Enumerable.Range(0, m).Select(_ => Math.Pow(random.NextDouble(), 3)).ToArray();
            var result = GraphicalProcedure.Adjust(graph, p, 0.05);
            for (var i = 0; i < m; i++)
            {
                var largest = 0.0;
                for (var mask = 1; mask < 1 << m; mask++)
                {
                    if ((mask & (1 << i)) == 0)
                    {
                        continue;
                    }
                    var w = IntersectionWeights(graph, mask);
                    var local = Enumerable.Range(0, m).Where(j => (mask & (1 << j)) != 0).Min(j => w[j] > 0 ? p[j] / w[j] : double.PositiveInfinity);
                    largest = Math.Max(largest, Math.Min(1, local));
                }
                Assert.True(Math.Abs(largest - result.Hypotheses[i].AdjustedP) <= 1e-12, $"trial {trial}, hypothesis {i + 1}: closed test {largest:R}, ours {result.Hypotheses[i].AdjustedP:R}");
            }
        }
    }

    /// <summary>The weights on the hypotheses of <paramref name="mask"/> once every other node is removed (Algorithm 1's update).</summary>
    private static double[] IntersectionWeights(MultiplicityGraph graph, int mask)
    {
        var m = graph.Count;
        var w = graph.Weights.ToArray();
        var g = Enumerable.Range(0, m).Select(i => graph.Transitions[i].ToArray()).ToArray();
        var alive = Enumerable.Range(0, m).ToHashSet();
        foreach (var j in Enumerable.Range(0, m).Where(j => (mask & (1 << j)) == 0))
        {
            alive.Remove(j);
            var h = new double[m][];
            for (var l = 0; l < m; l++)
            {
                h[l] = new double[m];
            }
            foreach (var l in alive)
            {
                w[l] += w[j] * g[j][l];
                foreach (var k in alive.Where(k => k != l))
                {
                    var denominator = 1 - g[l][j] * g[j][l];
                    h[l][k] = denominator > 0 ? (g[l][k] + g[l][j] * g[j][k]) / denominator : 0;
                }
            }
            w[j] = 0;
            g = h;
        }
        return w;
    }

    [Fact]
    public void The_fixed_sequence_graph_equals_the_fixed_sequence_procedure()
    {
        // Bretz et al. (2009), section 3: weight 1 on H1, g_{i,i+1} = 1 is the fixed sequence.
        double[][] cases = [[0.01, 0.04, 0.03, 0.2], [0.06, 0.01, 0.01], [0.001, 0.049, 0.05, 0.051, 0.0]];
        foreach (var p in cases)
        {
            var graph = GraphicalProcedure.Adjust(MultiplicityGraph.FixedSequence(p.Length), p, 0.05);
            var direct = FixedSequenceAdjustment.Adjust(p, 0.05);
            Assert.Equal(direct.Hypotheses.Select(h => h.AdjustedP), graph.Hypotheses.Select(h => h.AdjustedP));
            Assert.Equal(direct.Hypotheses.Select(h => h.RejectionOrder), graph.Hypotheses.Select(h => h.RejectionOrder));
        }
        // By hand: (0.01, 0.04, 0.03, 0.2) -> adjusted (0.01, 0.04, 0.04, 0.2), the first three rejected at 0.05 in order.
        Assert.Equal(new int?[] { 1, 2, 3, null }, FixedSequenceAdjustment.Adjust(cases[0], 0.05).Hypotheses.Select(h => h.RejectionOrder));
    }

    [Fact]
    public void The_fallback_procedure_makes_the_decisions_of_Wiens_2003()
    {
        // Wiens (2003, Pharmaceutical Statistics 2:211-215): H_i is tested at alpha_i' = alpha_i + alpha_{i-1}' when
        // H_{i-1} was rejected, else at alpha_i (alpha_1' = alpha_1); written out here independently of the graph.
        var random = new Random(7);
        for (var trial = 0; trial < 300; trial++)
        {
            var m = random.Next(1, 6);
            var raw = Enumerable.Range(0, m).Select(_ => random.NextDouble()).ToArray();
            var weights = raw.Select(w => w / raw.Sum()).ToArray();
            var p = Enumerable.Range(0, m).Select(_ => Math.Pow(random.NextDouble(), 3) * 0.1).ToArray();
            const double alpha = 0.05;
            var expected = new bool[m];
            var carried = 0.0;
            for (var i = 0; i < m; i++)
            {
                var level = weights[i] * alpha + carried;
                expected[i] = p[i] <= level;
                carried = expected[i] ? level : 0;
            }
            var result = MultipleTesting.Adjust(MultiplicityProcedure.Fallback, p, alpha, weights);
            Assert.Equal(expected, result.Hypotheses.Select(h => h.Rejected));
        }
    }

    [Fact]
    public void Weighted_bonferroni_divides_by_the_weight()
    {
        // By hand: p = (0.01, 0.02, 0.3), w = (0.5, 0.25, 0.25): adjusted 0.02, 0.08, 1 (capped); a weight of 0 gives 1.
        var result = MultipleTesting.Adjust(MultiplicityProcedure.WeightedBonferroni, [0.01, 0.02, 0.3], 0.05, [0.5, 0.25, 0.25]);
        Assert.Equal([0.02, 0.08, 1.0], result.Hypotheses.Select(h => h.AdjustedP));
        Assert.Equal(new int?[] { 1, null, null }, result.Hypotheses.Select(h => h.RejectionOrder));
        Assert.Equal(1.0, MultipleTesting.Adjust(MultiplicityProcedure.WeightedBonferroni, [0.0, 0.5], 0.05, [0, 1]).Hypotheses[0].AdjustedP);
    }

    [Theory]
    [InlineData(new[] { 0.6, 0.6 }, "the weights sum to 1.2; they must sum to at most 1")]
    [InlineData(new[] { -0.1, 0.5 }, "weight 1 is -0.1; a weight must lie between 0 and 1")]
    public void Weights_that_are_not_a_share_of_alpha_are_refused_with_the_reason(double[] weights, string message)
    {
        var e = Assert.Throws<ArgumentException>(() => new MultiplicityGraph(weights, Matrix([0, 1], [1, 0])));
        Assert.StartsWith(message, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_transition_matrix_breaking_the_rules_of_section_2_is_refused_with_the_reason()
    {
        double[] w = [0.5, 0.5, 0];
        Assert.StartsWith("row 2 of the transition matrix sums to 1.5; each row must sum to at most 1",
            Assert.Throws<ArgumentException>(() => new MultiplicityGraph(w, Matrix([0, 1, 0], [0.5, 0, 1], [0, 0, 0]))).Message, StringComparison.Ordinal);
        Assert.StartsWith("transition matrix entry (3, 3) is 0.5; the diagonal must be 0",
            Assert.Throws<ArgumentException>(() => new MultiplicityGraph(w, Matrix([0, 1, 0], [1, 0, 0], [0, 0, 0.5]))).Message, StringComparison.Ordinal);
        Assert.StartsWith("row 2 of the transition matrix has 2 entries; it must have 3",
            Assert.Throws<ArgumentException>(() => new MultiplicityGraph(w, Matrix([0, 1, 0], [1, 0], [0, 0, 0]))).Message, StringComparison.Ordinal);
        Assert.StartsWith("3 p-values for a graph of 2 hypotheses",
            Assert.Throws<ArgumentException>(() => GraphicalProcedure.Adjust(new MultiplicityGraph([0.5, 0.5], Matrix([0, 1], [1, 0])), [0.1, 0.2, 0.3], 0.05)).Message, StringComparison.Ordinal);
        Assert.StartsWith("p-value 2 is 1.5; a p-value must lie between 0 and 1",
            Assert.Throws<ArgumentException>(() => HolmAdjustment.Adjust([0.1, 1.5], 0.05)).Message, StringComparison.Ordinal);
    }

    private static MultiplicityGraph RandomGraph(Random random, int m)
    {
        var raw = Enumerable.Range(0, m).Select(_ => random.Next(0, 3) == 0 ? 0 : random.NextDouble()).ToArray();
        var sum = raw.Sum();
        var weights = sum > 0 ? raw.Select(w => w / sum).ToArray() : Enumerable.Repeat(1.0 / m, m).ToArray();
        var rows = new IReadOnlyList<double>[m];
        for (var i = 0; i < m; i++)
        {
            var row = Enumerable.Range(0, m).Select(j => j == i || random.Next(0, 2) == 0 ? 0 : random.NextDouble()).ToArray();
            var rowSum = row.Sum();
            rows[i] = rowSum > 0 ? row.Select(g => g / rowSum).ToArray() : row;
        }
        return new MultiplicityGraph(weights, rows);
    }

    private static MultiplicityGraph Reverse(MultiplicityGraph graph)
    {
        var m = graph.Count;
        return new MultiplicityGraph(graph.Weights.Reverse().ToArray(),
            Enumerable.Range(0, m).Select(i => (IReadOnlyList<double>)Enumerable.Range(0, m).Select(j => graph.Transitions[m - 1 - i][m - 1 - j]).ToArray()).ToArray());
    }
}
