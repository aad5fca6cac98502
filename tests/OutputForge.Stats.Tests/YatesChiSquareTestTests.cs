namespace OutputForge.Stats.Tests;

public class YatesChiSquareTestTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.ChiSquare("yates").Select(row => new object[]
    {
        row.GetProperty("a").GetInt32(), row.GetProperty("b").GetInt32(), row.GetProperty("c").GetInt32(), row.GetProperty("d").GetInt32(),
        row.GetProperty("r_statistic").GetDouble(), row.GetProperty("r_p").GetDouble(),
        row.GetProperty("scipy_statistic").GetDouble(), row.GetProperty("scipy_p").GetDouble(),
    });

    /// <summary>
    /// R 4.2.2 chisq.test(correct = TRUE) and scipy 1.10.1 chi2_contingency(correction = True), values in
    /// Oracles/chi_square_oracles.json. The table 10/10/11/10 has |ad - bc| below n/2, where the
    /// correction is capped and X^2 = 0.
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesRAndScipy(int a, int b, int c, int d, double rStatistic, double rP, double scipyStatistic, double scipyP)
    {
        var result = YatesChiSquareTest.TwoByTwo(a, b, c, d);
        Assert.Equal(rStatistic, result.Statistic!.Value, 1e-12 + rStatistic * 1e-12);
        Assert.Equal(scipyStatistic, result.Statistic!.Value, 1e-12 + scipyStatistic * 1e-12);
        Assert.Equal(rP, result.PValue, rP * 1e-9);
        Assert.Equal(scipyP, result.PValue, scipyP * 1e-9);
        Assert.Equal(1, result.DegreesOfFreedom);
    }

    /// <summary>
    /// Closed form N(|ad - bc| - N/2)^2 / (R1 R2 C1 C2) when |ad - bc| is at least N/2 (Fleiss, Levin
    /// and Paik 2003, Statistical Methods for Rates and Proportions, 3rd ed., equation 6.6).
    /// </summary>
    [Theory]
    [InlineData(12, 5, 3, 14)]
    [InlineData(1, 30, 9, 20)]
    public void EqualsClosedForm(int a, int b, int c, int d)
    {
        double n = a + b + c + d;
        double expected = n * Math.Pow(Math.Abs((double)a * d - (double)b * c) - n / 2, 2) / ((double)(a + b) * (c + d) * (a + c) * (b + d));
        Assert.Equal(expected, YatesChiSquareTest.TwoByTwo(a, b, c, d).Statistic!.Value, expected * 1e-12);
    }

    [Fact]
    public void LargerTableThrowsAndZeroMarginIsNotEstimable()
    {
        Assert.Throws<ArgumentException>(() => YatesChiSquareTest.Compute(new int[2, 3]));
        Assert.False(YatesChiSquareTest.TwoByTwo(0, 5, 0, 7).IsEstimable);
    }
}
