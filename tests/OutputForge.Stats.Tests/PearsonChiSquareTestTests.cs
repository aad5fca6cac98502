namespace OutputForge.Stats.Tests;

public class PearsonChiSquareTestTests
{
    public static IEnumerable<object[]> ScipyCases() => ReferenceOracles.Section("chi_square").Select(row => new object[]
    {
        row.GetProperty("table").EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetInt32()).ToArray()).ToArray(),
        row.GetProperty("statistic").GetDouble(), row.GetProperty("p").GetDouble(), row.GetProperty("df").GetInt32(),
    });

    /// <summary>scipy 1.10.1 chi2_contingency(correction=False), values in Oracles/proportion_table_oracles.json.</summary>
    [Theory]
    [MemberData(nameof(ScipyCases))]
    public void MatchesScipy(int[][] rows, double statistic, double p, int df)
    {
        var result = PearsonChiSquareTest.Compute(ToTable(rows));
        Assert.Equal("Pearson's chi-square test", result.Method);
        Assert.Equal(df, result.DegreesOfFreedom);
        Assert.Equal(statistic, result.Statistic!.Value, statistic * 1e-12);
        Assert.Equal(p, result.PValue, p * 1e-9);
    }

    /// <summary>
    /// For a 2 x 2 table X^2 equals z^2 of the pooled two-proportion z test,
    /// z = (p1 - p2) / sqrt(pbar (1 - pbar) (1/n1 + 1/n2)) (Agresti 2013, Categorical Data Analysis,
    /// 3rd ed., section 3.2.3; Fleiss, Levin and Paik 2003, section 2.1).
    /// </summary>
    [Theory]
    [InlineData(56, 70, 48, 80)]
    [InlineData(9, 10, 3, 10)]
    [InlineData(5, 56, 1, 29)]
    [InlineData(120, 300, 95, 310)]
    public void TwoByTwoEqualsSquaredPooledZ(int x1, int n1, int x2, int n2)
    {
        double p1 = (double)x1 / n1;
        double p2 = (double)x2 / n2;
        double pooled = (double)(x1 + x2) / (n1 + n2);
        double z = (p1 - p2) / Math.Sqrt(pooled * (1 - pooled) * (1.0 / n1 + 1.0 / n2));
        var result = PearsonChiSquareTest.Compute(new[,] { { x1, n1 - x1 }, { x2, n2 - x2 } });
        Assert.Equal(z * z, result.Statistic!.Value, z * z * 1e-12);
        Assert.Equal(1, result.DegreesOfFreedom);
    }

    [Fact]
    public void ZeroTotalColumnIsDroppedAndReported()
    {
        var full = PearsonChiSquareTest.Compute(new[,] { { 10, 0, 20, 30 }, { 20, 0, 15, 5 } });
        var reduced = PearsonChiSquareTest.Compute(new[,] { { 10, 20, 30 }, { 20, 15, 5 } });
        Assert.Equal(reduced.Statistic, full.Statistic);
        Assert.Equal(2, full.DegreesOfFreedom);
        Assert.Single(full.Notes);
        Assert.Contains("Column 2", full.Notes[0]);
        Assert.Empty(reduced.Notes);
    }

    [Fact]
    public void TableReducingBelowTwoByTwoIsNotEstimable()
    {
        var result = PearsonChiSquareTest.Compute(new[,] { { 10, 5 }, { 0, 0 } });
        Assert.False(result.IsEstimable);
        Assert.Contains("one row", result.NotEstimableReason);
        Assert.False(PearsonChiSquareTest.Compute(new int[2, 2]).IsEstimable);
        Assert.False(PearsonChiSquareTest.Compute(new[,] { { 1, 2, 3 } }).IsEstimable);
    }

    /// <summary>[[3, 1], [1, 3]] has every expected count 2: the warning must travel with each chi-square result.</summary>
    [Fact]
    public void SmallExpectedCountsAreReported()
    {
        var table = new[,] { { 3, 1 }, { 1, 3 } };
        foreach (var result in new[] { PearsonChiSquareTest.Compute(table), YatesChiSquareTest.Compute(table), LikelihoodRatioChiSquareTest.Compute(table) })
        {
            Assert.Contains(result.Notes, n => n.StartsWith("4 of 4 cells (100%) have expected counts below 5 (smallest 2.00)", StringComparison.Ordinal));
        }
        Assert.Empty(PearsonChiSquareTest.Compute(new[,] { { 10, 20, 30 }, { 20, 15, 5 } }).Notes);
    }

    [Fact]
    public void NegativeCountThrows()
        => Assert.Throws<ArgumentOutOfRangeException>(() => PearsonChiSquareTest.Compute(new[,] { { 1, -2 }, { 3, 4 } }));

    internal static int[,] ToTable(int[][] rows)
    {
        var table = new int[rows.Length, rows[0].Length];
        for (int i = 0; i < rows.Length; i++)
        {
            for (int j = 0; j < rows[0].Length; j++)
            {
                table[i, j] = rows[i][j];
            }
        }
        return table;
    }
}
