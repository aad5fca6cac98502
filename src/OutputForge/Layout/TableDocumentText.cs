using OutputForge.Common;

namespace OutputForge.Layout;

/// <summary>
/// The document text rule (<see cref="DocumentText"/>) applied to a whole laid-out table, piece by piece: each source is
/// checked where it is read, and this catches text assembled from several pieces before any renderer draws it.
/// </summary>
public static class TableDocumentText
{
    /// <summary>The first problem of a laid-out document, named by its place ("title line 2", "row 3 label", ...), or null.</summary>
    public static string? FirstProblem(TableDocument document)
    {
        foreach (var (place, text) in Pieces(document))
        {
            if (DocumentText.Problem(text) is { } problem)
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
