using ClosedXML.Excel;
using OutputForge.Results;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// The "results" sheet of a combined workbook: every number of every table in long format, one
/// row per number with the fields of results.json (docs/results.md), a frozen header row and an
/// autofilter, so a QC statistician can filter by table, row, column or statistic and compare.
/// Values are numeric cells with Excel's 15 significant digits (results.json has the full double);
/// everything else is text, never parsed.
/// </summary>
public static class ExcelResultsSheet
{
    public const string Name = "results";

    private static readonly (string Header, double Width)[] Columns =
    [
        ("table", 12), ("row", 24), ("column", 16), ("statistic", 12), ("value", 22), ("formatted", 14),
        ("rowLabel", 40), ("columnLabel", 16), ("method", 30), ("note", 40),
    ];

    public static void Write(IXLWorksheet sheet, IReadOnlyList<ResultRecord> records)
    {
        for (int c = 0; c < Columns.Length; c++)
        {
            var cell = sheet.Cell(1, c + 1);
            Text(cell, Columns[c].Header);
            cell.Style.Font.Bold = true;
            sheet.Column(c + 1).Width = Columns[c].Width;
        }
        int row = 2;
        // Every number cell gets the same style: it is built on the first and then assigned whole, one look-up in
        // ClosedXML's style repository instead of two changes per cell.
        IXLStyle? numberStyle = null;
        foreach (var record in records)
        {
            Text(sheet.Cell(row, 1), record.Table);
            Text(sheet.Cell(row, 2), record.Row);
            Text(sheet.Cell(row, 3), record.Column);
            Text(sheet.Cell(row, 4), record.Statistic);
            if (record.Value is double value && double.IsFinite(value))
            {
                // One lookup of the cell (ClosedXML finds or makes it by address on every call).
                var cell = sheet.Cell(row, 5);
                cell.SetValue(value);
                if (numberStyle is null)
                {
                    // General shows up to 11 significant digits; the cell holds 15.
                    cell.Style.NumberFormat.Format = "General";
                    cell.Style.Alignment.Horizontal = XLAlignmentHorizontalValues.Left;
                    numberStyle = cell.Style;
                }
                else
                {
                    cell.Style = numberStyle;
                }
            }
            else if (record.Value is double other)
            {
                Text(sheet.Cell(row, 5), other.ToString(System.Globalization.CultureInfo.InvariantCulture));
            }
            Text(sheet.Cell(row, 6), record.Formatted);
            Text(sheet.Cell(row, 7), record.RowLabel);
            Text(sheet.Cell(row, 8), record.ColumnLabel);
            Text(sheet.Cell(row, 9), record.Method ?? string.Empty);
            Text(sheet.Cell(row, 10), record.Note ?? string.Empty);
            row++;
        }
        sheet.Range(1, 1, Math.Max(1, row - 1), Columns.Length).SetAutoFilter();
        sheet.SheetView.FreezeRows(1);
        sheet.PageSetup.PageOrientation = XLPageOrientation.Landscape;
        sheet.PageSetup.SetRowsToRepeatAtTop(1, 1);
        sheet.PageSetup.FitToPages(1, 0);
    }

    private static void Text(IXLCell cell, string text)
    {
        cell.SetValue(text);
        cell.DataType = XLDataType.Text;
    }
}
