namespace OutputForge.Templates;

/// <summary>
/// A template's output as printed lines: "\r\n" read as "\n", trailing blanks of each line and
/// empty lines at the start and end dropped (a template file's final newline prints nothing);
/// empty lines in between are kept, as deliberate spacing.
/// </summary>
public static class TemplateOutput
{
    public static IReadOnlyList<string> Lines(string output)
    {
        var lines = output.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n').Select(l => l.TrimEnd()).ToList();
        int start = lines.FindIndex(l => l.Length > 0);
        if (start < 0)
            return [];
        int end = lines.FindLastIndex(l => l.Length > 0);
        return lines.GetRange(start, end - start + 1);
    }

    /// <summary>The output as one line (lines joined by a space), for single-line slots such as the study line.</summary>
    public static string Line(string output) => string.Join(" ", Lines(output));
}
