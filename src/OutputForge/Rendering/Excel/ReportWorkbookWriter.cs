using ClosedXML.Excel;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// Writes a workflow report's sheets (<see cref="ReportSheet"/>) as one workbook: per sheet a bold, frozen header row and
/// rows of text. Every cell is stored as text, so a value such as "=A1", "-3.2" or "@x" shows as written and is never
/// evaluated as a formula. Column widths are computed here from the longest text (ClosedXML's AdjustToContents needs
/// system fonts that Linux hosts lack).
/// </summary>
public static class ReportWorkbookWriter
{
    private const int MaxWidth = 80;

    /// <summary>Saves the workbook; a failure to write is an <see cref="IOException"/> naming the file.</summary>
    public static void Save(IReadOnlyList<ReportSheet> sheets, string path)
    {
        using var workbook = new XLWorkbook();
        foreach (var sheet in sheets)
        {
            Add(workbook, sheet);
        }
        var folder = Path.GetDirectoryName(Path.GetFullPath(path));
        if (folder is not null)
        {
            Directory.CreateDirectory(folder);
        }
        workbook.SaveAs(path);
    }

    private static void Add(XLWorkbook workbook, ReportSheet report)
    {
        var sheet = workbook.Worksheets.Add(report.Name);
        var all = new List<IReadOnlyList<string>> { report.Header };
        all.AddRange(report.Rows);
        for (var r = 0; r < all.Count; r++)
        {
            for (var c = 0; c < all[r].Count; c++)
            {
                var cell = sheet.Cell(r + 1, c + 1);
                cell.SetValue(all[r][c]);
                cell.DataType = XLDataType.Text;
            }
        }
        sheet.Row(1).Style.Font.Bold = true;
        sheet.SheetView.FreezeRows(1);
        // Printed, a report keeps its columns together: landscape, one page wide, header row on every page.
        sheet.PageSetup.PageOrientation = XLPageOrientation.Landscape;
        sheet.PageSetup.FitToPages(1, 0);
        sheet.PageSetup.SetRowsToRepeatAtTop(1, 1);
        for (var c = 0; c < report.Header.Count; c++)
        {
            var longest = all.Max(row => c < row.Count ? row[c].Split('\n').Max(line => line.Length) : 0);
            sheet.Column(c + 1).Width = Math.Min(MaxWidth, Math.Max(8, longest + 2));
        }
    }
}
