namespace OutputForge.Data.Xpt;

/// <summary>What a numeric variable's display format says its values are.</summary>
public enum TemporalKind { None, Date, DateTime, Time }

/// <summary>
/// Display formats of numeric transport-file variables that mark dates (day counts from 1960-01-01), datetimes
/// (seconds from 1960-01-01 00:00:00) and times (seconds from midnight). The names are those of the ISO 8601 and
/// calendar formats in common use in submission datasets (common practice): a format name is matched without its
/// width and decimals (DATE9. is DATE).
/// </summary>
public static class TemporalFormats
{
    private static readonly HashSet<string> Dates = new(StringComparer.OrdinalIgnoreCase)
    {
        "DATE", "DAY", "DDMMYY", "DDMMYYB", "DDMMYYC", "DDMMYYD", "DDMMYYN", "DDMMYYP", "DDMMYYS",
        "MMDDYY", "MMDDYYB", "MMDDYYC", "MMDDYYD", "MMDDYYN", "MMDDYYP", "MMDDYYS",
        "YYMMDD", "YYMMDDB", "YYMMDDC", "YYMMDDD", "YYMMDDN", "YYMMDDP", "YYMMDDS",
        "E8601DA", "B8601DA", "IS8601DA", "MONYY", "MMYY", "YYMM", "YYMON", "YYQ", "YEAR", "JULIAN",
        "WORDDATE", "WORDDATX", "WEEKDATE", "WEEKDATX", "DOWNAME", "MONNAME", "QTR", "NENGO", "EURDFDD",
    };

    private static readonly HashSet<string> DateTimes = new(StringComparer.OrdinalIgnoreCase)
    {
        "DATETIME", "DATEAMPM", "E8601DT", "B8601DT", "IS8601DT", "E8601DN", "B8601DN", "E8601DZ", "B8601DZ", "IS8601DZ",
        "MDYAMPM", "DTDATE", "DTYYMMDD",
    };

    private static readonly HashSet<string> Times = new(StringComparer.OrdinalIgnoreCase)
    {
        "TIME", "TIMEAMPM", "TOD", "HHMM", "HOUR", "MMSS", "E8601TM", "B8601TM", "IS8601TM", "E8601TZ", "B8601TZ", "IS8601TZ",
    };

    /// <summary>The kind a format name (without width or decimals, blank-trimmed) gives numeric values.</summary>
    public static TemporalKind Of(string formatName)
    {
        var name = formatName.Trim();
        if (name.Length == 0) return TemporalKind.None;
        if (Dates.Contains(name)) return TemporalKind.Date;
        if (DateTimes.Contains(name)) return TemporalKind.DateTime;
        return Times.Contains(name) ? TemporalKind.Time : TemporalKind.None;
    }

    /// <summary>The name of a display format as written in a spec or Dataset-JSON ("DATE9.", "E8601DA10.") without width and decimals.</summary>
    public static string NameOf(string displayFormat)
    {
        var text = displayFormat.Trim();
        var end = text.Length;
        while (end > 0 && (char.IsAsciiDigit(text[end - 1]) || text[end - 1] == '.')) end--;
        return text[..end];
    }
}
