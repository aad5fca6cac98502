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

    /// <summary>
    /// Writes the sheet's frame for <paramref name="records"/>: header row, widths, frozen row, autofilter over every
    /// row to come, print setup, and a probe row that gives the value cells their style. The rows themselves are
    /// streamed into the saved package by <see cref="ExcelResultsRows.Fill"/>.
    /// </summary>
    public static void WriteFrame(IXLWorksheet sheet, IReadOnlyList<ResultRecord> records)
    {
        for (int c = 0; c < Columns.Length; c++)
        {
            var cell = sheet.Cell(1, c + 1);
            Text(cell, Columns[c].Header);
            cell.Style.Font.Bold = true;
            sheet.Column(c + 1).Width = Columns[c].Width;
        }
        if (records.Any(r => r.Value is double value && double.IsFinite(value)))
        {
            var probe = sheet.Cell(2, 5);
            probe.SetValue(ExcelResultsRows.ProbeValue);
            // General shows up to 11 significant digits; the cell holds 15.
            probe.Style.NumberFormat.Format = "General";
            probe.Style.Alignment.Horizontal = XLAlignmentHorizontalValues.Left;
        }
        sheet.Range(1, 1, records.Count + 1, Columns.Length).SetAutoFilter();
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
