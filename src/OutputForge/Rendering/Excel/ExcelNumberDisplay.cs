using System.Globalization;
using System.Text.RegularExpressions;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// What a spreadsheet shows for a number under a simple fixed-decimals format ("0", "0.0",
/// "0.000", optionally with "%"). Used to refuse a numeric cell whose display would differ from
/// the text printed in the Word table. Spreadsheets keep 15 significant digits and round halves
/// away from zero (Microsoft, "Floating-point arithmetic may give inaccurate results in Excel");
/// the conversion to decimal below also keeps 15 significant digits (.NET Convert.ToDecimal(Double)).
/// </summary>
public static partial class ExcelNumberDisplay
{
    [GeneratedRegex(@"^0(?:\.(0+))?(%?)$")]
    private static partial Regex FixedDecimals();

    /// <summary>The displayed text, or null when the format is not one of the simple formats.</summary>
    public static string? Display(double value, string format)
    {
        var match = FixedDecimals().Match(format);
        if (!match.Success || double.IsNaN(value) || double.IsInfinity(value))
            return null;
        int decimals = match.Groups[1].Value.Length;
        bool percent = match.Groups[2].Value.Length > 0;
        double scaled = percent ? value * 100 : value;
        if (Math.Abs(scaled) >= 1e15)
            return null;
        decimal rounded = Math.Round(Convert.ToDecimal(scaled), decimals, MidpointRounding.AwayFromZero);
        string text = rounded.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return percent ? text + "%" : text;
    }

    /// <summary>
    /// True when the format is not a simple one (nothing to check) or the display equals the text.
    /// A rounded zero matches with or without its minus sign, because applications differ there.
    /// </summary>
    public static bool Agrees(double value, string format, string text)
    {
        string? shown = Display(value, format);
        if (shown is null || shown == text)
            return true;
        return IsZero(shown) && shown.TrimStart('-') == text.TrimStart('-');
    }

    private static bool IsZero(string shown) => shown.All(c => c is '0' or '.' or '-' or '%');
}
