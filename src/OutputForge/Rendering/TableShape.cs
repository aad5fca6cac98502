using OutputForge.Layout;

namespace OutputForge.Rendering;

/// <summary>
/// Checks that a <see cref="TableDocument"/> is rectangular before any renderer draws it, so a
/// malformed layout fails with one clear message instead of a half-written file.
/// </summary>
public static class TableShape
{
    public static void Check(TableDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        string table = document.Heading;
        if (document.Columns.Count == 0)
            throw new TableRenderException($"{table}: the table has no columns.");

        for (int r = 0; r < document.HeaderRows.Count; r++)
        {
            var cells = document.HeaderRows[r].Cells;
            if (cells.Any(c => c.Span < 1))
                throw new TableRenderException($"{table}: header row {r + 1} has a cell spanning fewer than one column.");
            int covered = cells.Sum(c => c.Span);
            if (covered != document.Columns.Count)
                throw new TableRenderException(
                    $"{table}: header row {r + 1} covers {covered} columns but the table has {document.Columns.Count}.");
        }

        int expectedCells = document.Columns.Count - 1;
        for (int r = 0; r < document.Rows.Count; r++)
        {
            var row = document.Rows[r];
            if (row.Cells.Count != expectedCells)
                throw new TableRenderException(
                    $"{table}: body row {r + 1} (\"{row.Label}\") has {row.Cells.Count} cells but the table has {expectedCells} value columns.");
            if (row.Indent < 0)
                throw new TableRenderException($"{table}: body row {r + 1} (\"{row.Label}\") has a negative indent.");
        }
    }
}
