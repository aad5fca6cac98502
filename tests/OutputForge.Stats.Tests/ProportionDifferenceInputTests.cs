namespace OutputForge.Stats.Tests;

/// <summary>Edge cases and invalid input of <see cref="ProportionDifferenceInterval"/> (behaviour specified in docs/methods.md).</summary>
public class ProportionDifferenceInputTests
{
    public static IEnumerable<object[]> Methods() => Enum.GetValues<DifferenceCiMethod>().Select(m => new object[] { m });

    [Theory]
    [MemberData(nameof(Methods))]
    public void EmptyGroupIsNotEstimable(DifferenceCiMethod method)
    {
        Assert.False(ProportionDifferenceInterval.Compute(0, 0, 3, 10, method).IsEstimable);
        Assert.False(ProportionDifferenceInterval.Compute(3, 10, 0, 0, method).IsEstimable);
    }

    [Theory]
    [InlineData(-1, 10, 3, 10, 0.95)]
    [InlineData(11, 10, 3, 10, 0.95)]
    [InlineData(3, 10, 11, 10, 0.95)]
    [InlineData(3, 10, 3, 10, 1.5)]
    public void InvalidInputThrows(int x1, int n1, int x2, int n2, double level)
        => Assert.Throws<ArgumentOutOfRangeException>(() => ProportionDifferenceInterval.Compute(x1, n1, x2, n2, DifferenceCiMethod.Newcombe, level));

    [Theory]
    [MemberData(nameof(Methods))]
    public void EveryCellCombinationGivesAnOrderedIntervalInsideTheParameterSpace(DifferenceCiMethod method)
    {
        foreach (var (n1, n2) in new[] { (1, 1), (4, 7), (10, 20) })
        {
            for (int x1 = 0; x1 <= n1; x1++)
            {
                for (int x2 = 0; x2 <= n2; x2++)
                {
                    var result = ProportionDifferenceInterval.Compute(x1, n1, x2, n2, method);
                    Assert.True(result.IsEstimable);
                    Assert.InRange(result.Lower, -1, result.Estimate + 1e-9);
                    Assert.InRange(result.Upper, result.Estimate - 1e-9, 1);
                }
            }
        }
    }

    [Fact]
    public void MiettinenNurminenIsAntisymmetricInTheGroups()
    {
        // Swapping the groups negates the difference, so the interval must mirror exactly
        // (a property of the score statistic, Miettinen and Nurminen 1985).
        for (int x1 = 0; x1 <= 7; x1++)
        {
            for (int x2 = 0; x2 <= 12; x2++)
            {
                var forward = ProportionDifferenceInterval.Compute(x1, 7, x2, 12, DifferenceCiMethod.MiettinenNurminen);
                var backward = ProportionDifferenceInterval.Compute(x2, 12, x1, 7, DifferenceCiMethod.MiettinenNurminen);
                Assert.Equal(forward.Lower, -backward.Upper, 1e-10);
                Assert.Equal(forward.Upper, -backward.Lower, 1e-10);
            }
        }
    }
}
