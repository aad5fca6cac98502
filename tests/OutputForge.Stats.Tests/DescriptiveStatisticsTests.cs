namespace OutputForge.Stats.Tests;

/// <summary>
/// Descriptive statistics. Quantile definitions from Hyndman and Fan (1996), The American
/// Statistician 50:361-365 (types 2 and 7); the values below are hand computations from those
/// definitions.
/// </summary>
public sealed class DescriptiveStatisticsTests
{
    [Fact]
    public void Summarizes_a_small_sample_by_hand()
    {
        // 1, 2, 3, 4: mean 2.5, SD sqrt(5/3); type 2 Q1 = (x1 + x2) / 2 = 1.5 (np = 1 is whole), Q3 = 3.5;
        // type 7 Q1 at h = 0.75: 1 + 0.75 = 1.75, Q3 = 3.25.
        var type2 = DescriptiveStatistics.Compute([4, 1, 3, 2]);
        Assert.Equal(4, type2.N);
        Assert.Equal(2.5, type2.Mean);
        Assert.Equal(Math.Sqrt(5.0 / 3.0), type2.StandardDeviation!.Value, 14);
        Assert.Equal(2.5, type2.Median);
        Assert.Equal(1.5, type2.FirstQuartile);
        Assert.Equal(3.5, type2.ThirdQuartile);
        Assert.Equal(1, type2.Minimum);
        Assert.Equal(4, type2.Maximum);
        var type7 = DescriptiveStatistics.Compute([4, 1, 3, 2], QuantileMethod.HyndmanFan7);
        Assert.Equal(1.75, type7.FirstQuartile);
        Assert.Equal(3.25, type7.ThirdQuartile);
    }

    [Fact]
    public void Type_2_takes_the_next_order_statistic_when_np_is_not_whole()
    {
        // n = 5: np = 1.25 for Q1 -> x2; np = 2.5 for the median -> x3; np = 3.75 for Q3 -> x4.
        var summary = DescriptiveStatistics.Compute([10, 20, 30, 40, 50]);
        Assert.Equal(20, summary.FirstQuartile);
        Assert.Equal(30, summary.Median);
        Assert.Equal(40, summary.ThirdQuartile);
    }

    [Theory]
    [InlineData(40.2, 40.3, "40.25")]
    [InlineData(162.8, 162.9, "162.85")]
    [InlineData(60.5, 60.6, "60.55")]
    public void A_median_between_two_values_is_their_exact_decimal_midpoint(double a, double b, string midpoint)
    {
        // Averaged in binary, 40.2 and 40.3 give 40.249999999999993 or so; the display rounding then goes the wrong way.
        var median = DescriptiveStatistics.Compute([a, b]).Median!.Value;
        Assert.Equal(midpoint, median.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Empty_and_single_value_samples_leave_undefined_statistics_null()
    {
        var empty = DescriptiveStatistics.Compute([]);
        Assert.Equal(0, empty.N);
        Assert.Null(empty.Mean);
        var single = DescriptiveStatistics.Compute([7.5]);
        Assert.Equal(7.5, single.Mean);
        Assert.Null(single.StandardDeviation);
        Assert.Equal(7.5, single.Median);
    }

    [Fact]
    public void Keeps_its_digits_when_the_values_share_thirteen_leading_digits()
    {
        // NIST StRD SmLs07-style values: 1000000000000.4, .3, .5 -> mean 1000000000000.4, SD 0.1 (hand computation).
        var summary = DescriptiveStatistics.Compute([1000000000000.4, 1000000000000.3, 1000000000000.5]);
        Assert.Equal(0.1, summary.StandardDeviation!.Value, 12);
    }
}
