namespace OutputForge.Rendering.Excel;

/// <summary>
/// Worksheet names that Excel accepts: at most 31 characters, none of : \ / ? * [ ], no
/// apostrophe at either end, not empty, not "History" (reserved by Excel), and unique within the
/// workbook ignoring case (Excel's own rules, as enforced by its sheet rename dialog).
/// </summary>
public sealed class ExcelSheetName
{
    public const int MaxLength = 31;

    private static readonly char[] Forbidden = [':', '\\', '/', '?', '*', '[', ']'];

    private readonly HashSet<string> _used = new(StringComparer.OrdinalIgnoreCase);

    /// <summary>A valid name close to <paramref name="wanted"/> and different from all names given before.</summary>
    public string Next(string wanted)
    {
        string name = Sanitize(wanted);
        string candidate = name;
        for (int n = 2; _used.Contains(candidate); n++)
        {
            string suffix = $" ({n})";
            candidate = name[..Math.Min(name.Length, MaxLength - suffix.Length)].TrimEnd('\'') + suffix;
        }
        _used.Add(candidate);
        return candidate;
    }

    public static string Sanitize(string wanted)
    {
        var chars = wanted.Select(c => Forbidden.Contains(c) || char.IsControl(c) ? '_' : c).ToArray();
        string name = new string(chars).Trim().Trim('\'');
        if (name.Length > MaxLength)
            name = name[..MaxLength].TrimEnd().TrimEnd('\'');
        if (name.Length == 0)
            return "Table";
        return string.Equals(name, "History", StringComparison.OrdinalIgnoreCase) ? "History table" : name;
    }
}
