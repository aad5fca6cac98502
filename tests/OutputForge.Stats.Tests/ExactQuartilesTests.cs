using MathNet.Numerics.Statistics;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The one-sort median and quartiles give bit for bit what the separate median and quantile calls give,
/// for samples with repeated values, for a sample outside the decimal range (which goes to MathNet) and
/// for definitions other than R2 and R7.
/// </summary>
public sealed class ExactQuartilesTests
{
    [Fact]
    public void Quartiles_equal_the_separate_median_and_quantiles()
    {
        var random = new Random(20261202);
        var samples = new List<double[]> { new[] { 1e20, 3e20, 2e20, 5e20 }, new[] { 0.0, -0.0, 1.5, -2.5 } };
        foreach (var size in new[] { 1, 2, 3, 4, 7, 50, 501 })
        {
            samples.Add(Enumerable.Range(0, size).Select(_ => Math.Round(random.NextDouble() * 20, 1)).ToArray());
        }
        foreach (var values in samples)
        {
            foreach (var definition in new[] { QuantileDefinition.R2, QuantileDefinition.R7, QuantileDefinition.R5 })
            {
                var (median, q1, q3) = ExactQuantiles.Quartiles(values, definition);
                Assert.Equal(BitConverter.DoubleToInt64Bits(ExactQuantiles.Median(values)), BitConverter.DoubleToInt64Bits(median));
                Assert.Equal(BitConverter.DoubleToInt64Bits(ExactQuantiles.Quantile(values, 0.25m, definition)), BitConverter.DoubleToInt64Bits(q1));
                Assert.Equal(BitConverter.DoubleToInt64Bits(ExactQuantiles.Quantile(values, 0.75m, definition)), BitConverter.DoubleToInt64Bits(q3));
            }
        }
    }

    [Fact]
    public void Hand_computed_quartiles_of_one_to_four()
    {
        // 1, 2, 3, 4: type 2 median 2.5, Q1 = (x1 + x2) / 2 = 1.5, Q3 = 3.5 (Hyndman and Fan 1996).
        Assert.Equal((2.5, 1.5, 3.5), ExactQuantiles.Quartiles([4.0, 1, 3, 2], QuantileDefinition.R2));
    }
}
