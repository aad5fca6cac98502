namespace OutputForge.Stats.Tests;

public class FisherLargeTableTests
{
    public static IEnumerable<object[]> Computed() => ReferenceOracles.FisherLarge.Select((row, index) => (row, index))
        .Where(pair => pair.row.TryGetProperty("p", out _)).Select(pair => new object[] { pair.index });

    /// <summary>
    /// R 4.2.2 fisher.test (FEXACT, workspace = 2e8) on invented tables with n from 2,000 to 20,000,
    /// values in Oracles/fisher_large_oracles.json from Oracles/generate_fisher_large_oracles.R, to
    /// 1e-6 relative (FEXACT's own tie tolerance and summation order move the 8th digit). Their timings
    /// are in docs/performance-micro.md (speed is measured by the benchmark, not here).
    /// </summary>
    [Theory]
    [MemberData(nameof(Computed))]
    public void MatchesRFisherTest(int index)
    {
        var row = ReferenceOracles.FisherLarge.ElementAt(index);
        var table = ReferenceOracles.Table(row.GetProperty("table"));
        var result = FisherExactTest.Compute(table);
        Assert.True(result.IsEstimable, result.NotEstimableReason);
        double expected = row.GetProperty("p").GetDouble();
        Assert.Equal(expected, result.PValue, expected * 1e-6);
    }

    /// <summary>
    /// The 5 x 3 reasons-for-discontinuation table with n = 2,819: R 4.2.2 fisher.test stops with
    /// FEXACT error 7 (recorded in the oracle file), and the network here would need more than
    /// NetworkSizeLimit steps for its bounds alone, so the result is not estimable, said at once.
    /// </summary>
    [Fact]
    public void TableBeyondExactReachIsRefusedAtOnce()
    {
        var row = ReferenceOracles.FisherLarge.Single(r => r.TryGetProperty("r_error", out _));
        Assert.StartsWith("FEXACT error", row.GetProperty("r_error").GetString());
        var result = FisherExactTest.Compute(ReferenceOracles.Table(row.GetProperty("table")));
        Assert.False(result.IsEstimable);
        Assert.Contains("too large", result.NotEstimableReason);
    }

    /// <summary>
    /// Invented tables of moderate n: the network (two-row and general) against the definition
    /// evaluated by listing every table with the margins (<see cref="FisherBruteForce"/>).
    /// </summary>
    [Theory]
    [InlineData(new[] { 3, 7, 2, 9, 5, 4 }, new[] { 8, 2, 6, 3, 4, 7 })]
    [InlineData(new[] { 12, 9, 15, 4 }, new[] { 10, 16, 8, 14 })]
    [InlineData(new[] { 0, 1, 0, 2, 9 }, new[] { 6, 5, 7, 4, 0 })]
    [InlineData(new[] { 20, 20, 20 }, new[] { 20, 20, 20 })]
    [InlineData(new[] { 1, 30, 2 }, new[] { 25, 3, 28 })]
    public void TwoRowNetworkEqualsFullEnumeration(int[] first, int[] second)
    {
        var table = new int[2, first.Length];
        var transposed = new int[first.Length, 2];
        for (int j = 0; j < first.Length; j++)
        {
            table[0, j] = transposed[j, 0] = first[j];
            table[1, j] = transposed[j, 1] = second[j];
        }
        double expected = FisherBruteForce.PValue(table);
        Assert.Equal(expected, FisherExactTest.Compute(table).PValue, Math.Max(expected * 1e-9, 1e-15));
        Assert.Equal(expected, FisherExactTest.Compute(transposed).PValue, Math.Max(expected * 1e-9, 1e-15));
    }

    [Theory]
    [InlineData(3, 3, 11)]
    [InlineData(3, 4, 12)]
    [InlineData(4, 3, 13)]
    [InlineData(3, 5, 14)]
    public void GeneralNetworkEqualsFullEnumeration(int rows, int columns, int seed)
    {
        var random = new Random(seed);
        var table = new int[rows, columns];
        for (int i = 0; i < rows; i++)
        {
            for (int j = 0; j < columns; j++)
            {
                table[i, j] = random.Next(0, 5 + i + j);
            }
        }
        double expected = FisherBruteForce.PValue(table);
        Assert.Equal(expected, FisherExactTest.Compute(table).PValue, Math.Max(expected * 1e-9, 1e-15));
    }

    /// <summary>
    /// More shapes for the two-ended network (forward pass, backward pass, join at the meeting column):
    /// random small tables, some with equal row totals (rows that merge in the sorted nodes) and zero
    /// cells, against listing every table with the margins.
    /// </summary>
    public static IEnumerable<object[]> SmallRandomTables()
    {
        var random = new Random(20261202);
        int[][] shapes = [[3, 3], [3, 4], [4, 3], [3, 6], [4, 4], [5, 3], [3, 7]];
        foreach (var shape in shapes)
        {
            for (int k = 0; k < 4; k++)
            {
                var table = new int[shape[0], shape[1]];
                for (int i = 0; i < shape[0]; i++)
                {
                    for (int j = 0; j < shape[1]; j++)
                    {
                        // Fewer units in the larger shapes keep the full listing to a second or so.
                        table[i, j] = k == 3 && i == 1 ? table[0, j] : random.Next(0, shape[0] * shape[1] > 15 ? 4 : 5);
                    }
                }
                yield return [table];
            }
        }
    }

    [Theory]
    [MemberData(nameof(SmallRandomTables))]
    public void TwoEndedNetworkEqualsFullEnumeration(int[,] table)
    {
        double expected = FisherBruteForce.PValue(table);
        Assert.Equal(expected, FisherExactTest.Compute(table).PValue, Math.Max(expected * 1e-9, 1e-15));
    }

    /// <summary>A two-row table with 80 million subjects would need gigabytes of bounds: refused at once, with the reason.</summary>
    [Fact]
    public void TwoRowTableBeyondTheMemoryBoundIsRefused()
    {
        var table = new[,] { { 10_000_000, 10_000_000, 10_000_000, 10_000_000 }, { 10_000_000, 10_000_000, 10_000_000, 10_000_000 } };
        var result = FisherExactTest.Compute(table);
        Assert.False(result.IsEstimable);
        Assert.Contains("too large", result.NotEstimableReason);
    }
}
