namespace OutputForge.Stats.Tests;

/// <summary>
/// The mean alone gives bit for bit the mean of the mean-and-sum-of-squares computation, on data
/// recorded to one decimal, on their logarithms (17 significant digits), on values with many constant
/// leading digits like NIST StRD SmLs07 (1000000000000.4, ...), on values outside the decimal range
/// (two-pass fallback) and on large values whose squared deviations pass the bound.
/// </summary>
public sealed class CentralMomentsMeanTests
{
    [Fact]
    public void Mean_equals_the_mean_of_the_full_computation()
    {
        var random = new Random(20261203);
        var samples = new List<double[]>
        {
            new[] { 1000000000000.4, 1000000000000.3, 1000000000000.5 },
            new[] { 1e16, 2e16, 3e16 },
            new[] { 1e-9, 2e-9 },
            new[] { 9e14, -9e14, 1e14, 5e14 },
            new[] { 42.0 },
        };
        foreach (var size in new[] { 2, 3, 10, 200, 5000 })
        {
            var recorded = Enumerable.Range(0, size).Select(_ => Math.Round(random.NextDouble() * 150 + 40, 1)).ToArray();
            samples.Add(recorded);
            samples.Add(recorded.Select(v => Math.Log(v)).ToArray());
        }
        samples.Add(Enumerable.Range(0, 20000).Select(i => i % 2 == 0 ? 4e12 : -4e12).ToArray());
        foreach (var values in samples)
        {
            Assert.Equal(BitConverter.DoubleToInt64Bits(CentralMoments.Compute(values).Mean), BitConverter.DoubleToInt64Bits(CentralMoments.Mean(values)));
        }
    }

    [Fact]
    public void Hand_computed_mean()
    {
        // (0.1 + 0.2 + 0.3) / 3 = 0.6 / 3 = 0.2 exactly in decimal arithmetic (by hand).
        Assert.Equal(0.2, CentralMoments.Mean([0.1, 0.2, 0.3]));
    }
}
