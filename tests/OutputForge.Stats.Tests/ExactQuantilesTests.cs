using MathNet.Numerics.Statistics;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Exact-decimal median and quartiles: the same values as MathNet.Numerics 5.0.0's
/// SortedArrayStatistics.QuantileCustom (definitions R2 and R7 of Hyndman and Fan 1996) to binary
/// precision, but landing exactly on decimal midpoints, which the display rounding needs.
/// </summary>
public sealed class ExactQuantilesTests
{
    [Theory]
    [InlineData(0.6, 0.7, "0.65")]
    [InlineData(0.1, 0.2, "0.15")]
    [InlineData(40.2, 40.3, "40.25")]
    [InlineData(162.8, 162.9, "162.85")]
    public void A_median_between_two_values_is_their_exact_decimal_midpoint(double a, double b, string midpoint)
    {
        // In binary, (0.6 + 0.7) / 2 = 0.6499999999999999 and (0.1 + 0.2) / 2 = 0.15000000000000002 (IEEE 754 double).
        Assert.Equal(midpoint, ExactQuantiles.Median([b, a]).ToString("R", System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Agrees_with_mathnet_on_random_samples()
    {
        var random = new Random(20261201);
        foreach (var size in new[] { 1, 2, 3, 4, 5, 10, 17, 100 })
        {
            var values = Enumerable.Range(0, size).Select(_ => Math.Round(random.NextDouble() * 200 - 50, 1)).ToArray();
            var sorted = values.Order().ToArray();
            foreach (var definition in new[] { QuantileDefinition.R2, QuantileDefinition.R7 })
            {
                foreach (var p in new[] { 0.25m, 0.5m, 0.75m })
                {
                    var expected = SortedArrayStatistics.QuantileCustom(sorted, (double)p, definition);
                    Assert.Equal(expected, ExactQuantiles.Quantile(values, p, definition), 10);
                }
            }
        }
    }

    [Fact]
    public void Hand_computed_quartiles_of_one_to_four()
    {
        // 1, 2, 3, 4: type 2 Q1 = (x1 + x2) / 2 = 1.5, Q3 = 3.5; type 7 Q1 = 1 + 0.75 = 1.75, Q3 = 3.25 (Hyndman and Fan 1996).
        double[] values = [4, 1, 3, 2];
        Assert.Equal(1.5, ExactQuantiles.Quantile(values, 0.25m, QuantileDefinition.R2));
        Assert.Equal(3.5, ExactQuantiles.Quantile(values, 0.75m, QuantileDefinition.R2));
        Assert.Equal(1.75, ExactQuantiles.Quantile(values, 0.25m, QuantileDefinition.R7));
        Assert.Equal(3.25, ExactQuantiles.Quantile(values, 0.75m, QuantileDefinition.R7));
        Assert.Equal(2.5, ExactQuantiles.Median(values));
    }
}
