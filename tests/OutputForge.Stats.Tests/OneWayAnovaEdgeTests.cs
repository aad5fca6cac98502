namespace OutputForge.Stats.Tests;

public class OneWayAnovaEdgeTests
{
    [Fact]
    public void EmptyGroupIsDroppedAndReported()
    {
        var groups = new List<IReadOnlyList<double>> { new[] { 1.0, 2, 3 }, Array.Empty<double>(), new[] { 4.0, 6, 5 } };
        var result = OneWayAnova.Compute(groups);
        Assert.Equal(1, result.BetweenDegreesOfFreedom);
        Assert.Contains(result.Notes, n => n.Contains("Group 2"));
        // Hand computation: group means 2 and 5, grand mean 3.5, SSB = 3(1.5^2) x 2 = 13.5, SSW = 2 + 2 = 4, F = 13.5 / 1 = 13.5.
        Assert.Equal(13.5, result.FStatistic, 12);
    }

    [Fact]
    public void DegenerateTablesAreNotEstimable()
    {
        Assert.False(OneWayAnova.Compute(new List<IReadOnlyList<double>> { new[] { 1.0, 2 } }).IsEstimable);
        Assert.False(OneWayAnova.Compute(new List<IReadOnlyList<double>> { new[] { 1.0 }, new[] { 2.0 } }).IsEstimable);
        Assert.False(OneWayAnova.Compute(new List<IReadOnlyList<double>> { new[] { 1.0, 1 }, new[] { 2.0, 2 } }).IsEstimable);
        Assert.Throws<ArgumentException>(() => OneWayAnova.Compute(new List<IReadOnlyList<double>> { new[] { 1.0, double.NaN }, new[] { 2.0, 3 } }));
    }
}
