using System.Globalization;

namespace OutputForge.Data;

/// <summary>
/// Numbers and dates written in a canonical form that can be rebuilt exactly from the parsed value, so a
/// column of them need not keep one string per cell. A canonical number is -?(0|[1-9][0-9]*)(.[0-9]+)?,
/// not negative zero, with at most 15 digits: it is m / 10^d with m and 10^d exact doubles, and one IEEE
/// division rounds correctly, so the value equals what double.Parse gives; with at most 15 significant
/// digits, formatting that double with d decimals ("F" format, exact since .NET Core 3.0) gives back the
/// same text. A canonical date is YYYY-MM-DD of a valid calendar date.
/// </summary>
internal static class CanonicalText
{
    private const int MaxDigits = 15;

    private static readonly double[] PowersOfTen =
        [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

    private static readonly string[] Formats = Enumerable.Range(0, MaxDigits + 1).Select(d => "F" + d.ToString(CultureInfo.InvariantCulture)).ToArray();

    /// <summary>Parses a canonical number from UTF-8 bytes; false for any other text (which the general parser then reads).</summary>
    public static bool TryParseNumber(ReadOnlySpan<byte> utf8, out double value, out int decimals)
    {
        value = 0;
        decimals = 0;
        var i = 0;
        var negative = utf8.Length > 0 && utf8[0] == (byte)'-';
        if (negative) i = 1;
        var start = i;
        long mantissa = 0;
        var digits = 0;
        while (i < utf8.Length && (uint)(utf8[i] - '0') <= 9)
        {
            mantissa = mantissa * 10 + (utf8[i] - '0');
            digits++;
            i++;
        }
        var integerDigits = i - start;
        if (integerDigits == 0 || (integerDigits > 1 && utf8[start] == (byte)'0')) return false;
        if (i < utf8.Length)
        {
            if (utf8[i] != (byte)'.') return false;
            i++;
            var fractionStart = i;
            while (i < utf8.Length && (uint)(utf8[i] - '0') <= 9)
            {
                mantissa = mantissa * 10 + (utf8[i] - '0');
                digits++;
                i++;
            }
            decimals = i - fractionStart;
            if (decimals == 0 || i != utf8.Length) return false;
        }
        if (digits > MaxDigits || (negative && mantissa == 0)) return false;
        value = mantissa / PowersOfTen[decimals];
        if (negative) value = -value;
        return true;
    }

    /// <summary>Parses YYYY-MM-DD of a valid date from UTF-8 bytes into its day number.</summary>
    public static bool TryParseDate(ReadOnlySpan<byte> utf8, out int dayNumber)
    {
        dayNumber = 0;
        if (utf8.Length != 10 || utf8[4] != (byte)'-' || utf8[7] != (byte)'-') return false;
        if (!TryDigits(utf8[..4], out var year) || !TryDigits(utf8.Slice(5, 2), out var month) || !TryDigits(utf8.Slice(8, 2), out var day))
            return false;
        if (year < 1 || month < 1 || month > 12 || day < 1 || day > DateTime.DaysInMonth(year, month)) return false;
        dayNumber = new DateOnly(year, month, day).DayNumber;
        return true;
    }

    private static bool TryDigits(ReadOnlySpan<byte> utf8, out int value)
    {
        value = 0;
        foreach (var b in utf8)
        {
            if ((uint)(b - '0') > 9) return false;
            value = value * 10 + (b - '0');
        }
        return true;
    }

    public static string FormatNumber(double value, int decimals) => value.ToString(Formats[decimals], CultureInfo.InvariantCulture);

    public static string FormatDate(double dayNumber) =>
        DateOnly.FromDayNumber((int)dayNumber).ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
