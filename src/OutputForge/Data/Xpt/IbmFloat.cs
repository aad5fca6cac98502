namespace OutputForge.Data.Xpt;

/// <summary>
/// Numbers of the XPT version 5 transport format: IBM System/360 hexadecimal floating point, big-endian, 8 bytes
/// (possibly truncated to 2-7 bytes, the dropped bytes being zero). The first byte holds the sign (bit 7) and a
/// base-16 exponent in excess 64; the other bytes a 56-bit fraction: value = 0.fraction x 16^(exponent - 64).
/// A missing value has a first byte of '.' (0x2E), '_' (0x5F) or 'A'-'Z' (0x41-0x5A) and zeros after it: the
/// 28 missing values . ._ .A-.Z. Source: the published description of the transport format (record layouts and
/// the conversion routines of its technical note, and IBM System/370 Principles of Operation, "Floating-Point
/// Data Format").
/// </summary>
public static class IbmFloat
{
    /// <summary>True when the bytes are one of the 28 missing values; <paramref name="letter"/> is '.', '_' or 'A'-'Z'.</summary>
    public static bool IsMissing(ReadOnlySpan<byte> bytes, out char letter)
    {
        letter = (char)bytes[0];
        var first = bytes[0];
        if (first != 0x2E && first != 0x5F && (first < 0x41 || first > 0x5A)) return false;
        return bytes[1..].IndexOfAnyExcept((byte)0) < 0;
    }

    /// <summary>The IEEE double of a present value (2 to 8 bytes), rounded to nearest when the fraction has more than 53 significant bits.</summary>
    public static double ToDouble(ReadOnlySpan<byte> bytes)
    {
        ulong fraction = 0;
        for (var i = 1; i < 8; i++)
        {
            fraction = (fraction << 8) | (i < bytes.Length ? bytes[i] : 0u);
        }
        if (fraction == 0) return 0;
        var exponent = (bytes[0] & 0x7F) - 64;
        var value = Math.ScaleB(fraction, 4 * exponent - 56);
        return (bytes[0] & 0x80) != 0 ? -value : value;
    }

    /// <summary>
    /// Writes <paramref name="value"/> as 8 bytes; NaN is written as the missing value '.'. An IEEE double's 53-bit
    /// significand fits the 56-bit fraction exactly (shifted by 0-3 bits to start at a hexadecimal digit), so every
    /// double in the format's range (about 5.4e-79 to 7.2e75) is written exactly; values outside it are refused.
    /// </summary>
    public static void Write(double value, Span<byte> bytes)
    {
        bytes[..8].Clear();
        if (double.IsNaN(value))
        {
            bytes[0] = 0x2E;
            return;
        }
        if (value == 0) return;
        if (double.IsInfinity(value)) throw new ArgumentOutOfRangeException(nameof(value), "infinity has no transport-format value");
        var bits = BitConverter.DoubleToUInt64Bits(value);
        var negative = (bits >> 63) != 0;
        var biased = (int)((bits >> 52) & 0x7FF);
        var significand = bits & 0xF_FFFF_FFFF_FFFFUL;
        int power;
        if (biased == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(value), $"{value} is too small for the transport format");
        }
        significand |= 1UL << 52;
        power = biased - 1075; // value = significand x 2^power
        // value = fraction x 2^(4E - 56) with 2^52 <= fraction < 2^56: shift so that 4E - 56 = power - shift.
        var shift = ((power % 4) + 4) % 4;
        var exponent = (power - shift + 56) / 4;
        var fraction = significand << shift;
        // Keep the fraction's leading hexadecimal digit non-zero: a shift of 0-3 leaves bit 52 in the top digit.
        if (exponent + 64 is < 0 or > 127)
        {
            throw new ArgumentOutOfRangeException(nameof(value), $"{value} is outside the transport format's range");
        }
        bytes[0] = (byte)((negative ? 0x80 : 0) | (exponent + 64));
        for (var i = 7; i >= 1; i--)
        {
            bytes[i] = (byte)(fraction & 0xFF);
            fraction >>= 8;
        }
    }
}
