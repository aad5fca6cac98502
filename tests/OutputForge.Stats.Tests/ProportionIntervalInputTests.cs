namespace OutputForge.Stats.Tests;

/// <summary>Edge cases and invalid input of <see cref="ProportionInterval"/> (behaviour specified in docs/methods.md).</summary>
public class ProportionIntervalInputTests
{
    [Theory]
    [InlineData(ProportionCiMethod.Wald)]
    [InlineData(ProportionCiMethod.Wilson)]
    [InlineData(ProportionCiMethod.WilsonCorrected)]
    [InlineData(ProportionCiMethod.ClopperPearson)]
    [InlineData(ProportionCiMethod.AgrestiCoull)]
    [InlineData(ProportionCiMethod.Jeffreys)]
    public void NoSubjectsIsNotEstimable(ProportionCiMethod method)
    {
        var result = ProportionInterval.Compute(0, 0, method);
        Assert.False(result.IsEstimable);
        Assert.Equal("no subjects", result.NotEstimableReason);
    }

    [Theory]
    [InlineData(-1, 10, 0.95)]
    [InlineData(11, 10, 0.95)]
    [InlineData(3, 10, 0.0)]
    [InlineData(3, 10, 1.0)]
    [InlineData(3, 10, double.NaN)]
    [InlineData(0, -1, 0.95)]
    public void InvalidInputThrows(int events, int n, double level)
        => Assert.Throws<ArgumentOutOfRangeException>(() => ProportionInterval.Compute(events, n, ProportionCiMethod.Wilson, level));

    [Theory]
    [InlineData(ProportionCiMethod.Wald)]
    [InlineData(ProportionCiMethod.Wilson)]
    [InlineData(ProportionCiMethod.WilsonCorrected)]
    [InlineData(ProportionCiMethod.ClopperPearson)]
    [InlineData(ProportionCiMethod.AgrestiCoull)]
    [InlineData(ProportionCiMethod.Jeffreys)]
    public void BoundsStayInsideUnitIntervalAndContainEstimate(ProportionCiMethod method)
    {
        foreach (int n in new[] { 1, 2, 5, 17, 100 })
        {
            for (int events = 0; events <= n; events++)
            {
                var result = ProportionInterval.Compute(events, n, method);
                Assert.InRange(result.Lower, 0, result.Estimate + 1e-12);
                Assert.InRange(result.Upper, result.Estimate - 1e-12, 1);
            }
        }
    }
}
