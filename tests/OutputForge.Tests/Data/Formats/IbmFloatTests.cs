using OutputForge.Data.Xpt;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// IBM System/360 hexadecimal floating point as the XPT version 5 transport format stores numbers. Worked values from
/// the format's definition (IBM System/370 Principles of Operation, "Floating-Point Data Format": value =
/// 0.fraction x 16^(exponent - 64)), computed by hand beside each case.
/// </summary>
public sealed class IbmFloatTests
{
    [Theory]
    [InlineData("4110000000000000", 1.0)]            // 0.1 (hex) x 16^1
    [InlineData("C276A00000000000", -118.625)]        // -(0.76A hex x 16^2) = -(7x16 + 6 + 10/16)
    [InlineData("4080000000000000", 0.5)]             // 0.8 (hex) x 16^0
    [InlineData("0000000000000000", 0.0)]             // an all-zero fraction is zero
    [InlineData("4264000000000000", 100.0)]           // 0.64 (hex) x 16^2 = 6x16 + 4 = 100
    public void Known_values_convert_both_ways(string hex, double value)
    {
        var bytes = Convert.FromHexString(hex);
        Assert.Equal(value, IbmFloat.ToDouble(bytes));
        var written = new byte[8];
        IbmFloat.Write(value, written);
        Assert.Equal(hex, Convert.ToHexString(written));
    }

    [Fact]
    public void Truncated_values_are_read_as_if_padded_with_zero_bytes()
    {
        Assert.Equal(100.0, IbmFloat.ToDouble(Convert.FromHexString("426400")));
        Assert.Equal(-118.625, IbmFloat.ToDouble(Convert.FromHexString("C276A0")));
    }

    [Fact]
    public void The_28_missing_values_are_recognised_and_nothing_else()
    {
        var letters = new[] { '.', '_' }.Concat(Enumerable.Range('A', 26).Select(c => (char)c)).ToList();
        Assert.Equal(28, letters.Count);
        foreach (var letter in letters)
        {
            var bytes = new byte[8];
            bytes[0] = (byte)letter;
            Assert.True(IbmFloat.IsMissing(bytes, out var read));
            Assert.Equal(letter, read);
        }
        Assert.False(IbmFloat.IsMissing(Convert.FromHexString("4110000000000000"), out _));
        Assert.False(IbmFloat.IsMissing(Convert.FromHexString("2E00000000000001"), out _));
        Assert.False(IbmFloat.IsMissing(new byte[8], out _)); // zero
        var nan = new byte[8];
        IbmFloat.Write(double.NaN, nan);
        Assert.True(IbmFloat.IsMissing(nan, out var dot) && dot == '.');
    }

    [Fact]
    public void Every_double_in_range_survives_writing_and_reading()
    {
        // A 53-bit significand fits the 56-bit fraction exactly, so no value changes (seeded, reproducible draws).
        var random = new Random(20261204);
        var bytes = new byte[8];
        for (var i = 0; i < 100_000; i++)
        {
            var value = (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-70, 70));
            IbmFloat.Write(value, bytes);
            Assert.Equal(value, IbmFloat.ToDouble(bytes));
        }
    }

    [Fact]
    public void Values_outside_the_formats_range_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => IbmFloat.Write(1e300, new byte[8]));
        Assert.Throws<ArgumentOutOfRangeException>(() => IbmFloat.Write(double.PositiveInfinity, new byte[8]));
    }
}
