using System.Text.Json;
using QuantileDefinition = MathNet.Numerics.Statistics.QuantileDefinition;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Descriptive statistics against numpy 1.24.2 / scipy 1.10.1 (Oracles/descriptive_oracles.json from
/// Oracles/generate_descriptive_oracles.py): numpy.quantile "averaged_inverted_cdf" is Hyndman-Fan
/// definition 2 (MathNet R2, the default here) and "linear" is definition 7 (MathNet R7).
/// </summary>
public class DescriptiveStatisticsTests
{
    private static readonly Lazy<JsonElement> Oracle = new(() => JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "descriptive_oracles.json"))).RootElement.GetProperty("data"));

    public static IEnumerable<object[]> Sets() => Oracle.Value.EnumerateObject().Select(p => new object[] { p.Name });

    [Theory]
    [MemberData(nameof(Sets))]
    public void MatchesNumpyAndScipy(string set)
    {
        var row = Oracle.Value.GetProperty(set);
        var values = row.GetProperty("values").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var summary = DescriptiveStatistics.Compute(values);
        var r7 = DescriptiveStatistics.Compute(values, QuantileDefinition.R7);
        Assert.Equal(values.Length, summary.N);
        Close(row, "mean", summary.Mean);
        Close(row, "median", summary.Median);
        Close(row, "min", summary.Minimum);
        Close(row, "max", summary.Maximum);
        Close(row, "q1_r2", summary.FirstQuartile);
        Close(row, "q3_r2", summary.ThirdQuartile);
        Close(row, "q1_r7", r7.FirstQuartile);
        Close(row, "q3_r7", r7.ThirdQuartile);
        if (row.TryGetProperty("sd", out _))
        {
            double tolerance = set == "large_offset" ? 1e-9 : 1e-12;
            Close(row, "sd", summary.StandardDeviation, tolerance);
            Close(row, "cv_percent", summary.CoefficientOfVariationPercent, tolerance);
        }
        else
        {
            Assert.Null(summary.StandardDeviation);
            Assert.Null(summary.CoefficientOfVariationPercent);
            Assert.NotEmpty(summary.Notes);
        }
        if (row.TryGetProperty("geometric_mean", out _))
        {
            Close(row, "geometric_mean", summary.GeometricMean);
        }
        else
        {
            Assert.Null(summary.GeometricMean);
            Assert.Contains(summary.Notes, n => n.Contains("geometric mean"));
        }
    }

    /// <summary>
    /// 1000000.1, .3, .2, .5, .4: mean 1000000.3, sum of squares 0.1, SD sqrt(0.025) exactly, by hand.
    /// numpy works on the binary values, which differ from the written decimals (its SD is off in the
    /// tenth digit); this library takes the numbers as written.
    /// </summary>
    [Fact]
    public void LargeOffsetGivesTheExactDecimalStandardDeviation()
    {
        var summary = DescriptiveStatistics.Compute(new[] { 1000000.1, 1000000.3, 1000000.2, 1000000.5, 1000000.4 });
        Assert.Equal(Math.Sqrt(0.025), summary.StandardDeviation!.Value, 1e-15);
        Assert.Equal(1000000.3, summary.Mean!.Value, 1e-9);
    }

    [Fact]
    public void EmptyInputHasNoStatisticsAndNonFiniteInputThrows()
    {
        var empty = DescriptiveStatistics.Compute(Array.Empty<double>());
        Assert.Equal(0, empty.N);
        Assert.Null(empty.Mean);
        Assert.Throws<ArgumentException>(() => DescriptiveStatistics.Compute(new[] { 1.0, double.NaN }));
    }

    private static void Close(JsonElement row, string name, double? actual, double tolerance = 1e-12)
    {
        double expected = row.GetProperty(name).GetDouble();
        Assert.NotNull(actual);
        Assert.True(Math.Abs(actual!.Value - expected) <= tolerance * Math.Max(1, Math.Abs(expected)), $"{name}: expected {expected:R}, got {actual:R}");
    }

    [Fact]
    public void A_median_on_a_rounding_midpoint_stays_on_it()
    {
        // Hand computation: the median of 0.6 and 0.7 is 0.65 exactly; in binary (0.6 + 0.7) / 2 is
        // 0.6499999999999999, which a one-decimal display rounding half away from zero would show as 0.6.
        var summary = DescriptiveStatistics.Compute([0.6, 0.7]);
        Assert.Equal(0.65, summary.Median);
        Assert.Equal("0.65", summary.Median!.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
    }
}
