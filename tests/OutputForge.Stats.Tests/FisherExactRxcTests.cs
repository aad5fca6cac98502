using System.Diagnostics;

namespace OutputForge.Stats.Tests;

public class FisherExactRxcTests
{
    private const int TenByThreeIndex = 4;

    public static IEnumerable<object[]> Cases() => ReferenceOracles.FisherRxc.Select((row, index) => new object[]
    {
        index, row.GetProperty("p").GetDouble(),
    }).Where(row => (int)row[0] != TenByThreeIndex);

    /// <summary>
    /// R 4.2.2 fisher.test (FEXACT network algorithm, workspace = 2e8) on invented r x c tables,
    /// values in Oracles/fisher_rxc_oracles.json from Oracles/generate_fisher_rxc_oracles.R.
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesRFisherTest(int index, double rP)
    {
        var table = ReferenceOracles.Table(ReferenceOracles.FisherRxc.ElementAt(index).GetProperty("table"));
        var result = FisherExactTest.Compute(table);
        Assert.True(result.IsEstimable, result.NotEstimableReason);
        Assert.Equal(rP, result.PValue, rP * 1e-8);
    }

    /// <summary>
    /// The invented 10 x 3 table with n = 250 (R 4.2.2 fisher.test p = 0.3746, about a minute and a half
    /// in R). The enumeration must end within a bounded time: either with R's value or, when the work
    /// limit is reached, as not estimable with that reason (never an approximation).
    /// </summary>
    [Fact]
    public void TenByThreeEndsInBoundedTimeAndNeverApproximates()
    {
        var row = ReferenceOracles.FisherRxc.ElementAt(TenByThreeIndex);
        var table = ReferenceOracles.Table(row.GetProperty("table"));
        var clock = Stopwatch.StartNew();
        var result = FisherExactTest.Compute(table);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(90), $"took {clock.Elapsed}");
        if (result.IsEstimable)
        {
            Assert.Equal(row.GetProperty("p").GetDouble(), result.PValue, 1e-8);
        }
        else
        {
            Assert.Contains("too large", result.NotEstimableReason);
        }
    }

    /// <summary>
    /// A 2 x 2 table through the network must equal the direct hypergeometric sum (the two
    /// computations share no code beyond the log-factorials).
    /// </summary>
    [Theory]
    [InlineData(12, 5, 3, 14)]
    [InlineData(25, 75, 40, 60)]
    [InlineData(3, 1, 1, 3)]
    public void NetworkAgreesWithHypergeometricSumOnTwoByTwo(int a, int b, int c, int d)
    {
        double? network = FisherNetworkEnumerationProbe.PValue(new[,] { { a, b }, { c, d } });
        Assert.Equal(FisherExactTest.TwoByTwo(a, b, c, d).PValue, network!.Value, 1e-12);
    }

    /// <summary>Transposing or permuting rows and columns cannot change the p-value.</summary>
    [Fact]
    public void InvariantToTranspositionAndPermutation()
    {
        var table = new[,] { { 2, 0, 5 }, { 4, 3, 1 }, { 0, 6, 2 }, { 1, 1, 3 } };
        var transposed = new[,] { { 2, 4, 0, 1 }, { 0, 3, 6, 1 }, { 5, 1, 2, 3 } };
        var permuted = new[,] { { 1, 3, 1 }, { 0, 2, 6 }, { 4, 1, 3 }, { 2, 5, 0 } };
        double p = FisherExactTest.Compute(table).PValue;
        Assert.Equal(p, FisherExactTest.Compute(transposed).PValue, 1e-12);
        Assert.Equal(p, FisherExactTest.Compute(permuted).PValue, 1e-12);
    }

    [Fact]
    public void ZeroRowIsDroppedAndReported()
    {
        var result = FisherExactTest.Compute(new[,] { { 3, 1, 4 }, { 0, 0, 0 }, { 1, 5, 2 } });
        Assert.Equal(FisherExactTest.Compute(new[,] { { 3, 1, 4 }, { 1, 5, 2 } }).PValue, result.PValue, 15);
        Assert.Contains(result.Notes, note => note.Contains("Row 2"));
    }
}
