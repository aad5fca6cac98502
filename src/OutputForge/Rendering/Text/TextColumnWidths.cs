using OutputForge.Layout;

namespace OutputForge.Rendering.Text;

/// <summary>
/// Character widths of the columns of a plain-text table: each column is as wide as its longest
/// line, and a spanning header widens the columns under it when it would not fit.
/// </summary>
public static class TextColumnWidths
{
    public static int[] Compute(TableDocument document, int indentWidth, int gap)
    {
        var widths = new int[document.Columns.Count];
        foreach (var row in document.Rows)
        {
            foreach (var line in CellLines.Split(row.Label))
                widths[0] = Math.Max(widths[0], row.Indent * indentWidth + line.Length);
            for (int c = 0; c < row.Cells.Count; c++)
                widths[c + 1] = Math.Max(widths[c + 1], CellLines.LongestLine(row.Cells[c].Display));
        }

        var placedRows = document.HeaderRows.Select(PlacedHeaderCell.Place).ToList();
        foreach (var placed in placedRows.SelectMany(p => p).Where(p => p.Cell.Span == 1))
            widths[placed.FirstColumn] = Math.Max(widths[placed.FirstColumn], CellLines.LongestLine(placed.Cell.Text));

        // Spanning cells last, so that they only add what the single columns do not already give.
        foreach (var placed in placedRows.SelectMany(p => p).Where(p => p.Cell.Span > 1))
        {
            int available = RegionWidth(widths, placed.FirstColumn, placed.LastColumn, gap);
            int missing = CellLines.LongestLine(placed.Cell.Text) - available;
            for (int i = 0; missing > 0; i++, missing--)
                widths[placed.LastColumn - i % placed.Cell.Span]++;
        }
        return widths;
    }

    /// <summary>Width from the start of the first column to the end of the last, gaps included.</summary>
    public static int RegionWidth(int[] widths, int first, int last, int gap)
    {
        int width = 0;
        for (int c = first; c <= last; c++)
            width += widths[c];
        return width + gap * (last - first);
    }
}
