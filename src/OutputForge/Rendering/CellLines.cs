namespace OutputForge.Rendering;

/// <summary>
/// Layout texts may carry deliberate line breaks ("Placebo\n(N=150)"); every renderer splits
/// them the same way so the line breaks match across formats.
/// </summary>
public static class CellLines
{
    public static string[] Split(string text) =>
        text.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');

    /// <summary>Length in characters of the longest line.</summary>
    public static int LongestLine(string text) => Split(text).Max(line => line.Length);
}
