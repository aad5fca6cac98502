using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Column widths of the Word table in twips. The table fills the text width; the label column is
/// as wide as its longest label (indentation included) but at most <see cref="MaxLabelShare"/> of
/// the width, longer labels wrap; the value columns share the rest equally.
/// </summary>
public static class WordColumnWidths
{
    public const double MaxLabelShare = 0.6;

    public static int[] Compute(TableDocument document, int textWidth, WordFontMetrics font, int indentTwips, int cellMarginTwips)
    {
        int columns = document.Columns.Count;
        if (columns == 1)
            return [textWidth];

        int labelNeed = 0;
        foreach (var row in document.Rows)
        {
            foreach (var line in CellLines.Split(row.Label))
                labelNeed = Math.Max(labelNeed, row.Indent * indentTwips + font.Width(line.Length));
        }
        int valueNeed = 0;
        foreach (var row in document.Rows)
        {
            foreach (var cell in row.Cells)
                valueNeed = Math.Max(valueNeed, font.Width(CellLines.LongestLine(cell.Display)));
        }
        foreach (var placed in document.HeaderRows.SelectMany(PlacedHeaderCell.Place).Where(p => p.Cell.Span == 1))
        {
            int need = font.Width(CellLines.LongestLine(placed.Cell.Text));
            if (placed.FirstColumn == 0)
                labelNeed = Math.Max(labelNeed, need);
            else
                valueNeed = Math.Max(valueNeed, need);
        }
        // One character of slack: an estimate that is exactly the text width makes the last word wrap.
        labelNeed += 2 * cellMarginTwips + font.Width(1);
        valueNeed += 2 * cellMarginTwips + font.Width(1);

        int label = Math.Min(labelNeed, (int)(textWidth * MaxLabelShare));
        // Give the value columns what their longest text needs before the label takes more.
        int leftForLabel = textWidth - (columns - 1) * valueNeed;
        if (leftForLabel < label)
            label = Math.Max(leftForLabel, textWidth / (2 * columns));

        var widths = new int[columns];
        widths[0] = label;
        int share = (textWidth - label) / (columns - 1);
        for (int c = 1; c < columns; c++)
            widths[c] = share;
        widths[^1] += textWidth - label - share * (columns - 1);
        return widths;
    }
}
