using System.Globalization;
using System.Text.RegularExpressions;

namespace OutputForge.Expressions;

/// <summary>
/// ISO 8601 calendar dates as ADaM writes them in text: a full date (YYYY-MM-DD), a partial date (YYYY, YYYY-MM) or a
/// date-time (YYYY-MM-DDThh:mm[:ss[.f]]). Such texts sort chronologically as text, so a condition may compare them with
/// a date; any other form (01MAR2025, 03/01/2025) would compare wrongly and is refused.
/// </summary>
public static partial class IsoDateText
{
    /// <summary>A valid YYYY-MM-DD date.</summary>
    public static bool IsDate(string text) =>
        text.Length == 10 && DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _);

    /// <summary>A full or partial ISO 8601 date or date-time whose date part, where complete, is a valid calendar date.</summary>
    public static bool IsDateOrDateTime(string text) =>
        Pattern().IsMatch(text) && (text.Length < 10 || IsDate(text[..10]));

    [GeneratedRegex(@"^\d{4}(-\d{2}(-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d+)?)?)?)?)?$")]
    private static partial Regex Pattern();
}
