using System.Globalization;
using System.Text;
using ClosedXML.Excel;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// A text projection of an .xlsx for snapshots: per sheet the column widths, frozen rows, merged
/// ranges, print setup, autofilter, and every used cell with its type, shown text, number
/// format, alignment, indentation and borders.
/// </summary>
public static class ExcelProjection
{
    public static string Of(string path)
    {
        using var workbook = new XLWorkbook(path);
        var text = new StringBuilder();
        foreach (var sheet in workbook.Worksheets)
        {
            text.Append(CultureInfo.InvariantCulture, $"sheet {sheet.Name}: font {sheet.Style.Font.FontName} {sheet.Style.Font.FontSize}\n");
            int lastColumn = sheet.LastColumnUsed()?.ColumnNumber() ?? 0;
            text.Append("  widths ").Append(string.Join(" ", Enumerable.Range(1, lastColumn).Select(c => sheet.Column(c).Width.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)))).Append('\n');
            text.Append(CultureInfo.InvariantCulture, $"  frozen rows {sheet.SheetView.SplitRow}\n");
            text.Append("  merged ").Append(string.Join(" ", sheet.MergedRanges.Select(r => r.RangeAddress.ToString()).Order(StringComparer.Ordinal))).Append('\n');
            var page = sheet.PageSetup;
            text.Append(CultureInfo.InvariantCulture, $"  print {page.PageOrientation} {page.PaperSize}, repeat rows {page.FirstRowToRepeatAtTop}-{page.LastRowToRepeatAtTop}, fit {page.PagesWide}x{page.PagesTall}\n");
            if (sheet.AutoFilter.IsEnabled)
                text.Append(CultureInfo.InvariantCulture, $"  autofilter {sheet.AutoFilter.Range.RangeAddress}\n");
            foreach (var cell in sheet.CellsUsed(XLCellsUsedOptions.All))
            {
                var flags = new List<string> { cell.DataType.ToString() };
                if (cell.DataType == XLDataType.Number)
                    flags.Add($"format {cell.Style.NumberFormat.Format}");
                flags.Add(cell.Style.Alignment.Horizontal.ToString());
                if (cell.Style.Alignment.Indent > 0)
                    flags.Add($"indent {cell.Style.Alignment.Indent}");
                if (cell.Style.Border.TopBorder != XLBorderStyleValues.None)
                    flags.Add("top " + cell.Style.Border.TopBorder);
                if (cell.Style.Border.BottomBorder != XLBorderStyleValues.None)
                    flags.Add("bottom " + cell.Style.Border.BottomBorder);
                if (cell.Style.Font.Bold)
                    flags.Add("bold");
                text.Append(CultureInfo.InvariantCulture, $"  {cell.Address} [{string.Join(", ", flags)}]: {cell.GetFormattedString().Replace("\n", "↵", StringComparison.Ordinal)}\n");
            }
        }
        return text.ToString();
    }
}
