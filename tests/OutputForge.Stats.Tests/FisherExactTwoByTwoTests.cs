namespace OutputForge.Stats.Tests;

public class FisherExactTwoByTwoTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.Section("fisher_2x2").Select(row => new object[]
    {
        row.GetProperty("a").GetInt32(), row.GetProperty("b").GetInt32(), row.GetProperty("c").GetInt32(),
        row.GetProperty("d").GetInt32(), row.GetProperty("r_p").GetDouble(), row.GetProperty("scipy_p").GetDouble(),
    });

    /// <summary>
    /// R 4.2.2 fisher.test and scipy 1.10.1 stats.fisher_exact (two-sided), values in
    /// Oracles/proportion_table_oracles.json, produced by Oracles/generate_proportion_table_oracles.py.
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesRAndScipy(int a, int b, int c, int d, double rP, double scipyP)
    {
        var result = FisherExactTest.TwoByTwo(a, b, c, d);
        Assert.Equal("Fisher's exact test", result.Method);
        Assert.Equal(rP, result.PValue, rP * 1e-10);
        Assert.Equal(scipyP, result.PValue, scipyP * 1e-10);
        var viaTable = FisherExactTest.Compute(new[,] { { a, b }, { c, d } });
        Assert.Equal(result.PValue, viaTable.PValue, 15);
    }

    /// <summary>
    /// Fisher's tea-tasting experiment, 3 of 4 cups right: one-sided P = 17/70 (Fisher 1935,
    /// The Design of Experiments, section 2); the two-sided p-value doubles it to 34/70 because the
    /// hypergeometric distribution 1, 16, 36, 16, 1 (/70) is symmetric.
    /// </summary>
    [Fact]
    public void TeaTastingIsThirtyFourSeventieths()
        => Assert.Equal(34.0 / 70.0, FisherExactTest.TwoByTwo(3, 1, 1, 3).PValue, 1e-14);

    /// <summary>No events in either arm: a single possible table, p = 1 (R 4.2.2 fisher.test gives 1).</summary>
    [Fact]
    public void ZeroMarginGivesOneWithANote()
    {
        var direct = FisherExactTest.TwoByTwo(0, 5, 0, 7);
        var viaTable = FisherExactTest.Compute(new[,] { { 0, 5 }, { 0, 7 } });
        Assert.Equal(1, direct.PValue);
        Assert.Equal(1, viaTable.PValue);
        Assert.NotEmpty(direct.Notes);
        Assert.Contains(viaTable.Notes, note => note.Contains("Column 1"));
    }

    [Fact]
    public void EmptyTableIsNotEstimable()
    {
        Assert.False(FisherExactTest.TwoByTwo(0, 0, 0, 0).IsEstimable);
        Assert.False(FisherExactTest.Compute(new int[2, 2]).IsEstimable);
    }

    [Fact]
    public void NegativeCellThrows()
        => Assert.Throws<ArgumentOutOfRangeException>(() => FisherExactTest.TwoByTwo(1, -1, 2, 3));
}
