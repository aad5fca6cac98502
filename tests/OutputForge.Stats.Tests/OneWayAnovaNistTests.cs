namespace OutputForge.Stats.Tests;

/// <summary>
/// One-way ANOVA against the certified values of the NIST Statistical Reference Datasets (StRD) for
/// analysis of variance, read from each file's header; agreement to at least 9 significant digits.
/// </summary>
public class OneWayAnovaNistTests
{
    private const double NineDigits = 1e-9;

    [NistStrdTheory]
    [InlineData("SiRstv.dat")]
    [InlineData("SmLs01.dat")]
    [InlineData("SmLs02.dat")]
    [InlineData("SmLs03.dat")]
    [InlineData("SmLs04.dat")]
    [InlineData("SmLs05.dat")]
    [InlineData("SmLs06.dat")]
    [InlineData("SmLs07.dat")]
    [InlineData("SmLs08.dat")]
    [InlineData("SmLs09.dat")]
    [InlineData("AtmWtAg.dat")]
    public void MatchesCertifiedValues(string file)
    {
        var nist = NistStrdAnovaFile.Read(file);
        var result = OneWayAnova.Compute(nist.Groups.Select(g => (IReadOnlyList<double>)g).ToList());
        Assert.True(result.IsEstimable, result.NotEstimableReason);
        Assert.Equal(nist.BetweenDf, result.BetweenDegreesOfFreedom);
        Assert.Equal(nist.WithinDf, result.WithinDegreesOfFreedom);
        AssertDigits(nist.BetweenSs, result.BetweenSumOfSquares, "between SS");
        AssertDigits(nist.WithinSs, result.WithinSumOfSquares, "within SS");
        AssertDigits(nist.BetweenMs, result.BetweenMeanSquare, "between MS");
        AssertDigits(nist.WithinMs, result.WithinMeanSquare, "within MS");
        AssertDigits(nist.F, result.FStatistic, "F");
        AssertDigits(nist.RSquared, result.RSquared, "R-squared");
        AssertDigits(nist.ResidualSd, result.ResidualStandardDeviation, "residual SD");
    }

    /// <summary>
    /// The per-group SDs of <see cref="DescriptiveStatistics"/> pool to the certified within-group mean
    /// square (sum (n_g - 1) s_g^2 / (N - k)), which checks the SD's numerical stability on data with up
    /// to 13 constant leading digits.
    /// </summary>
    [NistStrdTheory]
    [InlineData("SmLs03.dat")]
    [InlineData("SmLs06.dat")]
    [InlineData("SmLs09.dat")]
    [InlineData("AtmWtAg.dat")]
    public void DescriptiveStandardDeviationsPoolToCertifiedWithinMeanSquare(string file)
    {
        var nist = NistStrdAnovaFile.Read(file);
        double pooled = 0;
        foreach (var group in nist.Groups)
        {
            var summary = DescriptiveStatistics.Compute(group);
            pooled += (group.Count - 1) * summary.StandardDeviation!.Value * summary.StandardDeviation.Value;
        }
        AssertDigits(nist.WithinMs, pooled / nist.WithinDf, "pooled variance");
    }

    private static void AssertDigits(double certified, double actual, string what)
        => Assert.True(Math.Abs(actual - certified) <= NineDigits * Math.Abs(certified), $"{what}: certified {certified:R}, computed {actual:R}");
}
