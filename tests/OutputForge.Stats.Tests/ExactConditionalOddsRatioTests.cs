using System.Text.Json;

namespace OutputForge.Stats.Tests;

public class ExactConditionalOddsRatioTests
{
    /// <summary>uniroot's default tolerance, .Machine$double.eps^0.25, on the scale fisher.test searches (theta below 1, 1/theta above).</summary>
    private const double UnirootTolerance = 1.22e-4;

    public static IEnumerable<object[]> Cases() => ReferenceOracles.ConditionalOddsRatio.Select((row, index) => new object[] { index });

    private static (JsonElement Row, IntervalResult Result) Run(int index)
    {
        var row = ReferenceOracles.ConditionalOddsRatio.ElementAt(index);
        var result = ExactConditionalOddsRatio.Compute(row.GetProperty("events1").GetInt32(), row.GetProperty("n1").GetInt32(),
            row.GetProperty("events2").GetInt32(), row.GetProperty("n2").GetInt32(), row.GetProperty("level").GetDouble());
        return (row, result);
    }

    private static double Number(JsonElement value) => value.ValueKind == JsonValueKind.String ? double.Parse(value.GetString()!, System.Globalization.CultureInfo.InvariantCulture) : value.GetDouble();

    /// <summary>
    /// R 4.2.2: the same equations (conditional likelihood equation, Cornfield tail equations) solved
    /// to full precision on the log scale by Oracles/generate_conditional_odds_ratio_oracles.R, over
    /// 290 invented tables with zero cells, full groups and groups of up to 800.
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesPreciseSolutionOfTheSameEquations(int index)
    {
        var (row, result) = Run(index);
        if (!row.GetProperty("estimable").GetBoolean())
        {
            Assert.False(result.IsEstimable);
            return;
        }
        Assert.True(result.IsEstimable, result.NotEstimableReason);
        foreach (var (name, value) in new[] { ("estimate", result.Estimate), ("lower", result.Lower), ("upper", result.Upper) })
        {
            double expected = Number(row.GetProperty("precise_" + name));
            if (double.IsInfinity(expected) || expected == 0)
            {
                Assert.Equal(expected, value);
            }
            else
            {
                Assert.Equal(expected, value, expected * 1e-8);
            }
        }
    }

    /// <summary>
    /// R 4.2.2 fisher.test estimate and conf.int for the same tables, to the tolerance of uniroot,
    /// which fisher.test calls with its default (so a lower limit below 1.2e-4 can come out as 0 there).
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesRFisherTestWithinItsRootTolerance(int index)
    {
        var (row, result) = Run(index);
        if (!row.GetProperty("estimable").GetBoolean())
        {
            return;
        }
        foreach (var (name, value) in new[] { ("estimate", result.Estimate), ("lower", result.Lower), ("upper", result.Upper) })
        {
            double expected = Number(row.GetProperty("r_" + name));
            if (double.IsInfinity(expected))
            {
                Assert.Equal(expected, value);
            }
            else if (expected <= 1)
            {
                Assert.Equal(expected, value, UnirootTolerance);
            }
            else
            {
                Assert.Equal(1 / expected, 1 / value, UnirootTolerance);
            }
        }
    }

    /// <summary>
    /// Fisher's tea-tasting table [[3, 1], [1, 3]] (Fisher 1935; Agresti 2013 section 3.5.2): R 4.2.2
    /// fisher.test prints odds ratio 6.408309 and 95% interval 0.2117329 to 621.9337505.
    /// </summary>
    [Fact]
    public void TeaTasting()
    {
        var result = ExactConditionalOddsRatio.Compute(3, 4, 1, 4);
        Assert.Equal(1 / 6.408309, 1 / result.Estimate, UnirootTolerance);
        Assert.Equal(0.2117329, result.Lower, UnirootTolerance);
        Assert.Equal(1 / 621.9337505, 1 / result.Upper, UnirootTolerance);
    }

    /// <summary>
    /// The estimate solves E(a; theta) = a and the limits leave alpha/2 in each tail; checked here
    /// directly with the noncentral hypergeometric probabilities, independently of the root finder.
    /// </summary>
    [Fact]
    public void LimitsLeaveHalfAlphaInEachTail()
    {
        var result = ExactConditionalOddsRatio.Compute(12, 17, 3, 17, 0.9);
        var distribution = new NoncentralHypergeometric(17, 17, 15);
        Assert.Equal(0.05, distribution.AtLeast(12, Math.Log(result.Lower)), 1e-10);
        Assert.Equal(0.05, distribution.AtMost(12, Math.Log(result.Upper)), 1e-10);
        Assert.Equal(12, distribution.Mean(Math.Log(result.Estimate)), 1e-9);
    }

    [Fact]
    public void SmallestFirstCellGivesZeroEstimateAndLowerLimitWithANote()
    {
        var result = ExactConditionalOddsRatio.Compute(0, 10, 5, 10);
        Assert.Equal(0, result.Estimate);
        Assert.Equal(0, result.Lower);
        Assert.True(result.Upper > 0 && double.IsFinite(result.Upper));
        Assert.Contains(result.Notes, note => note.Contains("lower limit are 0"));
    }

    [Fact]
    public void LargestFirstCellGivesInfiniteEstimateAndUpperLimitWithANote()
    {
        var result = ExactConditionalOddsRatio.Compute(10, 10, 5, 10);
        Assert.True(double.IsPositiveInfinity(result.Estimate));
        Assert.True(double.IsPositiveInfinity(result.Upper));
        Assert.True(result.Lower > 0 && double.IsFinite(result.Lower));
        Assert.Contains(result.Notes, note => note.Contains("infinite"));
    }

    [Theory]
    [InlineData(0, 0, 2, 5, "no subjects in group 1")]
    [InlineData(2, 5, 0, 0, "no subjects in group 2")]
    [InlineData(0, 3, 0, 4, "no events")]
    [InlineData(3, 3, 4, 4, "every subject")]
    public void ZeroMarginIsNotEstimable(int e1, int n1, int e2, int n2, string reason)
    {
        var result = ExactConditionalOddsRatio.Compute(e1, n1, e2, n2);
        Assert.False(result.IsEstimable);
        Assert.Contains(reason, result.NotEstimableReason);
    }

    [Fact]
    public void BadInputThrows()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ExactConditionalOddsRatio.Compute(4, 3, 1, 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => ExactConditionalOddsRatio.Compute(1, 3, 1, 3, 1.0));
    }
}
