using OutputForge.Layout;

namespace OutputForge.Tests.Layout;

public sealed class NumberTextTests
{
    // Rounding half away from zero on the decimal value (common practice in clinical reporting):
    // 162.85 is stored as 162.849999... in binary, yet displays as 162.9; banker's rounding would give 40.2 for 40.25.
    [Theory]
    [InlineData(40.25, 1, "40.3")]
    [InlineData(162.85, 1, "162.9")]
    [InlineData(0.125, 2, "0.13")]
    [InlineData(2.675, 2, "2.68")]
    [InlineData(-2.5, 0, "-3")]
    [InlineData(-0.04, 1, "0.0")]
    [InlineData(24.83221476510067, 1, "24.8")]
    [InlineData(100, 1, "100.0")]
    [InlineData(1e-12, 3, "0.000")]
    public void Rounds_half_away_from_zero_on_the_decimal_value(double value, int decimals, string expected)
    {
        Assert.Equal(expected, NumberText.Fixed(value, decimals));
    }

    [Theory]
    [InlineData(0.00020459929168657498, 0.001, "<0.001")]
    [InlineData(0.001, 0.001, "0.001")]
    [InlineData(0.0405, 0.001, "0.041")]
    [InlineData(0.5, 0.001, "0.500")]
    [InlineData(0.9996, 0.001, ">0.999")]
    [InlineData(1.0, 0.001, ">0.999")]
    [InlineData(0.00005, 0.0001, "<0.0001")]
    [InlineData(0.01234, 0.0001, "0.0123")]
    public void Formats_p_values_with_their_threshold(double p, double floor, string expected)
    {
        Assert.Equal(expected, NumberText.PValue(p, floor));
    }
}
