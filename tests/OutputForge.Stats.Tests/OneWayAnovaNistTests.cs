namespace OutputForge.Stats.Tests;

/// <summary>
/// One-way ANOVA against the certified values of the NIST StRD analysis-of-variance datasets
/// (NIST ITL Statistical Reference Datasets, files in ../shared/reference/nist-strd). SmLs07-09
/// have 13 constant leading digits and defeat one-pass formulas. The bar is agreement to at least
/// 9 significant digits (common practice for StRD); the exact-decimal sums reach far more.
/// </summary>
public sealed class OneWayAnovaNistTests
{
    [NistStrdTheory]
    [InlineData("SiRstv.dat")]
    [InlineData("SmLs01.dat")]
    [InlineData("SmLs02.dat")]
    [InlineData("SmLs03.dat")]
    [InlineData("AtmWtAg.dat")]
    [InlineData("SmLs04.dat")]
    [InlineData("SmLs05.dat")]
    [InlineData("SmLs06.dat")]
    [InlineData("SmLs07.dat")]
    [InlineData("SmLs08.dat")]
    [InlineData("SmLs09.dat")]
    public void Reproduces_the_certified_anova_table(string file)
    {
        var nist = NistAnovaFile.Read(Path.Combine(NistAnovaFile.Folder()!, file));
        var result = OneWayAnova.Compute(nist.Groups);
        Assert.Equal(nist.DfBetween, result.DegreesOfFreedomBetween);
        Assert.Equal(nist.DfWithin, result.DegreesOfFreedomWithin);
        AssertDigits(nist.SsBetween, result.SumOfSquaresBetween, file);
        AssertDigits(nist.SsWithin, result.SumOfSquaresWithin, file);
        AssertDigits(nist.MsBetween, result.MeanSquareBetween, file);
        AssertDigits(nist.MsWithin, result.MeanSquareWithin, file);
        AssertDigits(nist.F, result.F, file);
        AssertDigits(nist.RSquared, result.RSquared, file);
        AssertDigits(nist.ResidualSd, result.ResidualStandardDeviation, file);
    }

    [NistStrdTheory]
    [InlineData("SiRstv.dat")]
    public void The_test_carries_f_and_the_numerator_degrees_of_freedom(string file)
    {
        var nist = NistAnovaFile.Read(Path.Combine(NistAnovaFile.Folder()!, file));
        var test = OneWayAnova.Test(nist.Groups);
        Assert.Equal(OneWayAnova.MethodName, test.Method);
        AssertDigits(nist.F, test.Statistic!.Value, file);
        Assert.Equal(4, test.DegreesOfFreedom);
        // Reference: the F distribution of MathNet.Numerics 5.0.0 at the certified F (upper tail = 1 - CDF).
        var identity = MathNet.Numerics.Distributions.FisherSnedecor.CDF(4, 20, nist.F);
        Assert.Equal(1 - identity, test.PValue, 12);
    }

    private static void AssertDigits(double certified, double actual, string file)
    {
        var relative = certified == 0 ? Math.Abs(actual) : Math.Abs(actual - certified) / Math.Abs(certified);
        Assert.True(relative < 1e-9, $"{file}: certified {certified:R}, computed {actual:R} (relative error {relative:E2})");
    }

    [Fact]
    public void Empty_groups_are_left_out_with_a_note_and_constant_groups_are_not_estimable()
    {
        IReadOnlyList<double> a = [1, 2, 3], b = [], c = [2, 3, 4];
        var test = OneWayAnova.Test([a, b, c]);
        Assert.True(test.IsEstimable);
        Assert.Contains("Group 2 has no values", test.Notes.Single());
        // Two groups of three, means 2 and 3: SSB = 1.5, SSW = 4, F = 1.5 / (4 / 4) = 1.5 (hand computation).
        Assert.Equal(1.5, test.Statistic!.Value, 12);

        IReadOnlyList<double> d = [5, 5], e = [7, 7];
        Assert.False(OneWayAnova.Test([d, e]).IsEstimable);
        Assert.False(OneWayAnova.Test([a]).IsEstimable);
    }
}
