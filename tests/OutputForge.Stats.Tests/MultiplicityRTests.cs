namespace OutputForge.Stats.Tests;

/// <summary>
/// Bonferroni, Holm, Hochberg and Hommel adjusted p-values against R 4.2.2 p.adjust (Oracles/multiplicity_oracles.json,
/// vectors with ties, zeros and p = 1), and Holm's procedure drawn as a graph against the same values (Bretz, Maurer,
/// Brannath and Posch 2009, section 3: the graph with weights 1/m and g_ij = 1/(m - 1) is Holm's procedure).
/// </summary>
public sealed class MultiplicityRTests
{
    private const double Agreement = 1e-12;

    public static TheoryData<string, MultiplicityProcedure> Procedures()
    {
        var data = new TheoryData<string, MultiplicityProcedure>();
        foreach (var c in MultiplicityOracles.PAdjustCases)
        {
            foreach (var p in new[] { MultiplicityProcedure.Bonferroni, MultiplicityProcedure.Holm, MultiplicityProcedure.Hochberg, MultiplicityProcedure.Hommel })
            {
                data.Add(c.GetProperty("name").GetString()!, p);
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(Procedures))]
    public void Adjusted_p_values_equal_R_p_adjust(string name, MultiplicityProcedure procedure)
    {
        var c = MultiplicityOracles.PAdjustCases.Single(e => e.GetProperty("name").GetString() == name);
        var p = MultiplicityOracles.Numbers(c.GetProperty("p"));
        var expected = MultiplicityOracles.Numbers(c.GetProperty(procedure.ToString().ToLowerInvariant()));
        var result = MultipleTesting.Adjust(procedure, p, 0.05);
        for (var i = 0; i < p.Length; i++)
        {
            Assert.Equal(p[i], result.Hypotheses[i].RawP);
            Assert.True(Math.Abs(expected[i] - result.Hypotheses[i].AdjustedP) <= Agreement,
                $"{name} {procedure} hypothesis {i + 1}: R {expected[i]:R}, ours {result.Hypotheses[i].AdjustedP:R}");
            Assert.Equal(expected[i] <= 0.05, result.Hypotheses[i].Rejected);
        }
    }

    [Fact]
    public void Holm_drawn_as_a_graph_gives_R_p_adjust_holm()
    {
        foreach (var c in MultiplicityOracles.PAdjustCases.Where(c => c.GetProperty("p").GetArrayLength() > 1))
        {
            var p = MultiplicityOracles.Numbers(c.GetProperty("p"));
            var expected = MultiplicityOracles.Numbers(c.GetProperty("holm"));
            var graph = GraphicalProcedure.Adjust(MultiplicityGraph.Holm(p.Length), p, 0.05);
            for (var i = 0; i < p.Length; i++)
            {
                Assert.True(Math.Abs(expected[i] - graph.Hypotheses[i].AdjustedP) <= 1e-12, $"{c.GetProperty("name")} hypothesis {i + 1}");
            }
        }
    }

    [Fact]
    public void Hommel_equals_the_closed_test_of_Simes_tests_over_every_subset()
    {
        // Hommel (1988) is the closed test of Simes tests: here every intersection is enumerated (2^m - 1 of them), an
        // independent check of the shortcut's largest-others argument on invented vectors with ties.
        var random = new Random(20261204);
        for (var trial = 0; trial < 200; trial++)
        {
            var m = random.Next(1, 8);
            var p = Enumerable.Range(0, m).Select(_ => Math.Round(Math.Pow(random.NextDouble(), 3), 2)).ToArray();
            var result = HommelAdjustment.Adjust(p, 0.05);
            for (var i = 0; i < m; i++)
            {
                var largest = 0.0;
                for (var mask = 1; mask < 1 << m; mask++)
                {
                    if ((mask & (1 << i)) == 0)
                    {
                        continue;
                    }
                    var members = Enumerable.Range(0, m).Where(j => (mask & (1 << j)) != 0).Select(j => p[j]).Order().ToArray();
                    var simes = Enumerable.Range(1, members.Length).Min(k => members.Length * members[k - 1] / k);
                    largest = Math.Max(largest, simes);
                }
                Assert.Equal(Math.Min(1, largest), result.Hypotheses[i].AdjustedP, 12);
            }
        }
    }

    [Fact]
    public void Holm_rejects_in_the_order_of_the_raw_p_values_ties_in_the_order_listed()
    {
        // Holm (1979): H_(1) first; hand-checked on (0.02, 0.02, 0.04, 0.01, 0.04) at alpha 0.1: adjusted 0.08, 0.08,
        // 0.08, 0.05, 0.08, all rejected; order H4, H1, H2, H3, H5.
        var result = HolmAdjustment.Adjust([0.02, 0.02, 0.04, 0.01, 0.04], 0.1);
        Assert.Equal(new int?[] { 2, 3, 4, 1, 5 }, result.Hypotheses.Select(h => h.RejectionOrder));
        var strict = HolmAdjustment.Adjust([0.02, 0.02, 0.04, 0.01, 0.04], 0.05);
        Assert.Equal(new int?[] { null, null, null, 1, null }, strict.Hypotheses.Select(h => h.RejectionOrder));
    }
}
