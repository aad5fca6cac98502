using OutputForge.Layout;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// Column widths in Excel's unit (characters of the workbook font), computed from the longest
/// text of each column because ClosedXML's AdjustToContents needs system fonts. Widths are capped;
/// longer texts wrap.
/// </summary>
public static class ExcelColumnWidths
{
    public const double MaxLabelWidth = 60;
    public const double MaxValueWidth = 28;
    public const double MinWidth = 8;

    /// <summary>Padding for the cell's own margins.</summary>
    private const double Padding = 2;

    /// <summary>One Excel indent level is three spaces of the normal font (ECMA-376 Part 1, 18.8.1 alignment@indent).</summary>
    public const int CharactersPerIndent = 3;

    public static double[] Compute(TableDocument document)
    {
        var longest = new int[document.Columns.Count];
        foreach (var row in document.Rows)
        {
            longest[0] = Math.Max(longest[0], row.Indent * CharactersPerIndent + CellLines.LongestLine(row.Label));
            for (int c = 0; c < row.Cells.Count; c++)
                longest[c + 1] = Math.Max(longest[c + 1], CellLines.LongestLine(row.Cells[c].Text));
        }
        foreach (var placed in document.HeaderRows.SelectMany(PlacedHeaderCell.Place).Where(p => p.Cell.Span == 1))
            longest[placed.FirstColumn] = Math.Max(longest[placed.FirstColumn], CellLines.LongestLine(placed.Cell.Text));

        var widths = new double[longest.Length];
        for (int c = 0; c < longest.Length; c++)
        {
            double cap = c == 0 ? MaxLabelWidth : MaxValueWidth;
            widths[c] = Math.Clamp(longest[c] + Padding, MinWidth, cap);
        }
        return widths;
    }
}
