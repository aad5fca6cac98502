using System.Globalization;
using ClosedXML.Excel;
using OutputForge.Layout;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// Lays one table out on a worksheet: heading, titles and population merged across the table,
/// a blank row, the header rows (spanning cells merged), the body, a blank row, the footnotes and
/// the source line. Numbers that the layout marks as single numbers are numeric cells; every other
/// text is stored as text, never parsed, so that "=1+1" or "-2.0 (-9.1, 5.1)" stays what it says.
/// </summary>
public sealed class ExcelSheetWriter
{
    private readonly TableDocument _document;
    private readonly double[] _widths;
    private readonly double _lineHeight;
    private int ColumnCount => _document.Columns.Count;

    public ExcelSheetWriter(TableDocument document)
    {
        _document = document;
        _widths = ExcelColumnWidths.Compute(document);
        // Row height in points per line of text: 1.35 times the font size, Excel's own ratio for
        // its default font (15 pt rows for 11 pt Calibri).
        _lineHeight = Math.Ceiling(document.Page.FontSizePoints * 1.35 * 4) / 4;
    }

    public void Write(IXLWorksheet sheet)
    {
        sheet.Style.Font.FontName = _document.Page.FontName;
        sheet.Style.Font.FontSize = _document.Page.FontSizePoints;
        for (int c = 0; c < ColumnCount; c++)
            sheet.Column(c + 1).Width = _widths[c];

        int row = 1;
        foreach (var line in _document.TitleLines)
            MergedLine(sheet, row++, line, XLAlignmentHorizontalValues.Center);
        row++;

        int firstHeaderRow = row;
        for (int h = 0; h < _document.HeaderRows.Count; h++)
            HeaderRow(sheet, row++, _document.HeaderRows[h], isLast: h == _document.HeaderRows.Count - 1);
        int lastHeaderRow = row - 1;

        foreach (var body in _document.Rows)
            BodyRow(sheet, row++, body);
        // The opening rule sits above the first header row (or the first body row when there is
        // no header), the closing rule under the last body row (or under the header).
        int lastTableRow = row - 1;
        if (lastTableRow >= firstHeaderRow)
        {
            RowRange(sheet, firstHeaderRow).Style.Border.TopBorder = XLBorderStyleValues.Thin;
            RowRange(sheet, lastTableRow).Style.Border.BottomBorder = XLBorderStyleValues.Thin;
        }
        row++;

        foreach (var footnote in _document.Footnotes)
            MergedLine(sheet, row++, footnote, XLAlignmentHorizontalValues.Left);
        foreach (var line in _document.FooterLines.SkipLast(1))
            MergedLine(sheet, row++, line, XLAlignmentHorizontalValues.Left);
        MergedLine(sheet, row, _document.FooterLines.LastOrDefault() ?? string.Empty, XLAlignmentHorizontalValues.Left);

        PageSetup(sheet, firstHeaderRow, lastHeaderRow, lastRow: row);
    }

    private IXLRange RowRange(IXLWorksheet sheet, int row) => sheet.Range(row, 1, row, ColumnCount);

    /// <summary>A line merged across the table; wrapped, with a row height for the lines it needs.</summary>
    private void MergedLine(IXLWorksheet sheet, int row, string text, XLAlignmentHorizontalValues alignment)
    {
        var range = RowRange(sheet, row);
        if (ColumnCount > 1)
            range.Merge();
        SetText(sheet.Cell(row, 1), text);
        range.Style.Alignment.Horizontal = alignment;
        range.Style.Alignment.Vertical = XLAlignmentVerticalValues.Top;
        range.Style.Alignment.WrapText = true;
        SetHeight(sheet, row, WrappedLines(text, _widths.Sum()));
    }

    private void HeaderRow(IXLWorksheet sheet, int row, HeaderRow header, bool isLast)
    {
        int lines = 1;
        foreach (var placed in PlacedHeaderCell.Place(header))
        {
            var range = sheet.Range(row, placed.FirstColumn + 1, row, placed.LastColumn + 1);
            if (placed.Cell.Span > 1)
                range.Merge();
            SetText(sheet.Cell(row, placed.FirstColumn + 1), placed.Cell.Text);
            bool isLabel = placed.FirstColumn == 0 && placed.Cell.Span == 1;
            range.Style.Alignment.Horizontal = isLabel ? Horizontal(_document.Columns[0].Alignment) : XLAlignmentHorizontalValues.Center;
            range.Style.Alignment.Vertical = XLAlignmentVerticalValues.Bottom;
            range.Style.Alignment.WrapText = true;
            if (isLast || (placed.Cell.Span > 1 && placed.Cell.Text.Trim().Length > 0))
                range.Style.Border.BottomBorder = XLBorderStyleValues.Thin;
            double width = Enumerable.Range(placed.FirstColumn, placed.Cell.Span).Sum(c => _widths[c]);
            lines = Math.Max(lines, WrappedLines(placed.Cell.Text, width));
        }
        SetHeight(sheet, row, lines);
    }

    private void BodyRow(IXLWorksheet sheet, int row, BodyRow body)
    {
        if (body.Kind == RowKind.Blank)
        {
            SetHeight(sheet, row, 1);
            return;
        }
        var label = sheet.Cell(row, 1);
        SetText(label, body.Label);
        label.Style.Alignment.Horizontal = Horizontal(_document.Columns[0].Alignment);
        label.Style.Alignment.Indent = body.Indent;
        label.Style.Alignment.WrapText = true;
        int lines = WrappedLines(body.Label, _widths[0] - body.Indent * ExcelColumnWidths.CharactersPerIndent);

        for (int c = 0; c < body.Cells.Count; c++)
        {
            var layout = body.Cells[c];
            var cell = sheet.Cell(row, c + 2);
            if (layout.Number is double number && double.IsFinite(number) && layout.ExcelFormat is string format)
            {
                if (!ExcelNumberDisplay.Agrees(number, format, layout.Text))
                    throw new TableRenderException(
                        $"{_document.Heading}, row \"{body.Label}\", column {c + 2}: the number " +
                        $"{number.ToString("R", CultureInfo.InvariantCulture)} in format \"{format}\" would show " +
                        $"\"{ExcelNumberDisplay.Display(number, format)}\" but the table shows \"{layout.Text}\".");
                cell.SetValue(number);
                cell.Style.NumberFormat.Format = format;
            }
            else
            {
                // Without a format (or with no finite number) the spreadsheet could not show the
                // layout's text: keep the text.
                SetText(cell, layout.Text);
            }
            cell.Style.Alignment.Horizontal = Horizontal(_document.Columns[c + 1].Alignment);
            cell.Style.Alignment.Vertical = XLAlignmentVerticalValues.Top;
            cell.Style.Alignment.WrapText = true;
            lines = Math.Max(lines, WrappedLines(layout.Text, _widths[c + 1]));
        }
        label.Style.Alignment.Vertical = XLAlignmentVerticalValues.Top;
        SetHeight(sheet, row, lines);
    }

    /// <summary>Stores text as text: no formula, number or date recognition.</summary>
    private static void SetText(IXLCell cell, string text)
    {
        cell.SetValue(text.Replace("\r\n", "\n", StringComparison.Ordinal));
        cell.DataType = XLDataType.Text;
    }

    private void SetHeight(IXLWorksheet sheet, int row, int lines) =>
        sheet.Row(row).Height = Math.Max(1, lines) * _lineHeight;

    /// <summary>How many lines a text needs in a column of the given width (in characters).</summary>
    private static int WrappedLines(string text, double width)
    {
        int usable = Math.Max(1, (int)Math.Floor(width) - 1);
        return CellLines.Split(text).Sum(line => Math.Max(1, (line.Length + usable - 1) / usable));
    }

    private void PageSetup(IXLWorksheet sheet, int firstHeaderRow, int lastHeaderRow, int lastRow)
    {
        if (lastHeaderRow >= firstHeaderRow)
            sheet.SheetView.FreezeRows(lastHeaderRow);

        var page = sheet.PageSetup;
        page.PageOrientation = _document.Page.Orientation == PageOrientation.Landscape
            ? XLPageOrientation.Landscape
            : XLPageOrientation.Portrait;
        page.PaperSize = _document.Page.Paper == PaperSize.A4 ? XLPaperSize.A4Paper : XLPaperSize.LetterPaper;
        page.FitToPages(1, 0);
        // Titles and column headers are printed again at the top of every page.
        page.SetRowsToRepeatAtTop(1, Math.Max(lastHeaderRow, firstHeaderRow - 2));
        page.ShowGridlines = false;
        page.CenterHorizontally = true;
        page.Margins.Left = _document.Page.MarginInches;
        page.Margins.Right = _document.Page.MarginInches;
        page.Margins.Top = _document.Page.MarginInches;
        page.Margins.Bottom = _document.Page.MarginInches;
        // As in the Word table: half an inch from the paper edge, or half a narrower margin.
        page.Margins.Header = Math.Min(0.5, _document.Page.MarginInches / 2);
        page.Margins.Footer = page.Margins.Header;
        page.PrintAreas.Add(1, 1, lastRow, ColumnCount);

        // "&" starts a header code in SpreadsheetML (ECMA-376 Part 1, 18.3.1.39); "&&" prints one.
        // Header and footer texts are codes (ECMA-376 Part 1, 18.3.1.39): "&&" prints one "&",
        // &9 sets the size and &"Font,Regular" the font, so the page header uses the table's font.
        // The size code comes first: digits right after it would be read as part of the size.
        string font = FontCode();
        page.Header.Left.AddText(font + _document.StudyLine.Replace("&", "&&", StringComparison.Ordinal));
        page.Header.Right.AddText(font + "Page ");
        page.Header.Right.AddText(XLHFPredefinedText.PageNumber);
        page.Header.Right.AddText(" of ");
        page.Header.Right.AddText(XLHFPredefinedText.NumberOfPages);
    }

    private string FontCode()
    {
        int size = Math.Max(1, (int)Math.Round(_document.Page.FontSizePoints));
        string name = _document.Page.FontName.Replace("\"", string.Empty, StringComparison.Ordinal);
        return string.Create(CultureInfo.InvariantCulture, $"&{size}&\"{name},Regular\"");
    }

    private static XLAlignmentHorizontalValues Horizontal(CellAlignment alignment) => alignment switch
    {
        CellAlignment.Center => XLAlignmentHorizontalValues.Center,
        CellAlignment.Right => XLAlignmentHorizontalValues.Right,
        _ => XLAlignmentHorizontalValues.Left,
    };
}
