using OutputForge.Data;

namespace OutputForge.Layout;

/// <summary>
/// The one rule for text that reaches a table document, whatever its source (spec, data, template) and format: at most
/// <see cref="MaxLength"/> characters in one piece, and none of the characters of <see cref="ControlCharacters"/>.
/// Each source is checked where it is read, so the error names the spec path, data line or template; the laid-out
/// document is checked once more before any renderer draws it (text assembled from several pieces).
/// </summary>
public static class DocumentText
{
    /// <summary>
    /// The most characters in one piece of text: what one spreadsheet cell holds (32,767, the documented cell limit of
    /// the spreadsheet format's main application, common practice), kept in every format so that Word, text and Excel
    /// show the same document.
    /// </summary>
    public const int MaxLength = 32_767;

    public static string TooLong(int length) =>
        FormattableString.Invariant($"the text is {length:N0} characters long, more than the {MaxLength:N0} one table cell can hold (the same limit in every format)");

    /// <summary>What is wrong with <paramref name="text"/> for a document, or null when it can be shown as it is.</summary>
    public static string? Problem(string? text)
    {
        if (text is null)
        {
            return null;
        }
        if (text.Length > MaxLength)
        {
            return TooLong(text.Length);
        }
        var at = ControlCharacters.IndexIn(text);
        return at < 0 ? null : $"the text holds {ControlCharacters.Describe(text, at)} at character {at + 1}, which Word and Excel cannot store";
    }

    /// <summary>The first problem of a laid-out document, named by its place ("title line 2", "row 3 label", ...), or null.</summary>
    public static string? FirstProblem(TableDocument document)
    {
        foreach (var (place, text) in Pieces(document))
        {
            if (Problem(text) is { } problem)
            {
                return $"{place}: {problem}";
            }
        }
        return null;
    }

    private static IEnumerable<(string Place, string Text)> Pieces(TableDocument document)
    {
        for (var i = 0; i < document.TitleLines.Count; i++)
        {
            yield return ($"title line {i + 1}", document.TitleLines[i]);
        }
        yield return ("continued line", document.ContinuedLine);
        yield return ("study line", document.StudyLine);
        for (var h = 0; h < document.HeaderRows.Count; h++)
        {
            foreach (var cell in document.HeaderRows[h].Cells)
            {
                yield return ($"column header row {h + 1}", cell.Text);
            }
        }
        for (var r = 0; r < document.Rows.Count; r++)
        {
            var row = document.Rows[r];
            yield return ($"row {r + 1} label", row.Label);
            foreach (var cell in row.Cells)
            {
                yield return ($"row {r + 1}", cell.Display);
            }
        }
        for (var i = 0; i < document.Footnotes.Count; i++)
        {
            yield return ($"footnote {i + 1}", document.Footnotes[i]);
        }
        for (var i = 0; i < document.FooterLines.Count; i++)
        {
            yield return ($"page footer line {i + 1}", document.FooterLines[i]);
        }
    }
}
