using System.Text.RegularExpressions;

namespace OutputForge.Data;

/// <summary>
/// Values that read as numbers but that no statistic can use: NaN, infinities, numbers beyond
/// <see cref="MaxMagnitude"/>, and numbers written with a decimal comma or a thousands separator. In a column whose
/// other values are numbers each is a data error at its line (never a silent missing value or text).
/// </summary>
internal static partial class UnusableNumber
{
    /// <summary>
    /// The largest magnitude read. The statistics form sums of squares and cross-products of the values; a value above
    /// about 1.3e154 has a square beyond the double range (1.8e308), and values far below that lose every digit of
    /// a mean or a variance to a single large one. 1e100 leaves room for sums over any number of records, and no
    /// measurement of a clinical trial comes near it.
    /// </summary>
    public const double MaxMagnitude = 1e100;

    /// <summary>Whether a number read is one OutputForge uses: finite and at most <see cref="MaxMagnitude"/> in magnitude.</summary>
    public static bool IsUsable(double number) => Math.Abs(number) <= MaxMagnitude;

    /// <summary>Why the value cannot be used (the message after the quoted value), or null for a usable number or plain text.</summary>
    /// <param name="parsed">Whether the invariant-culture parser read the text as a number, giving <paramref name="number"/>.</param>
    public static string? Problem(string value, bool parsed, double number)
    {
        if (parsed)
        {
            if (double.IsNaN(number))
            {
                return "is not a number (leave a missing value empty; NaN is refused)";
            }
            if (double.IsInfinity(number))
            {
                return value.Contains("inf", StringComparison.OrdinalIgnoreCase) || value.Contains('\u221E')
                    ? "is infinite; numbers must be finite (leave a missing value empty)"
                    : $"overflows: it is beyond the double range; OutputForge reads numbers up to {MaxMagnitude:0e0} in magnitude";
            }
            return Math.Abs(number) > MaxMagnitude
                ? $"is beyond {MaxMagnitude:0e0} in magnitude, the largest OutputForge reads (sums of squares of larger numbers overflow)"
                : null;
        }
        return value.Contains(',') && CommaNumber().IsMatch(value)
            ? "is not a number: write numbers with a decimal point and no thousands separator (e.g. 1.5, 1000)"
            : null;
    }

    /// <summary>Digits with a decimal comma or thousands separators (1,5; 1.000,5; 1,000.5; ,5), optionally signed.</summary>
    [GeneratedRegex(@"^\s*[+-]?(\d+([.,]\d+)*|[.,]\d+)\s*$")]
    private static partial Regex CommaNumber();
}
