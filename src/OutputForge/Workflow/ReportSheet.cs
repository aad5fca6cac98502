using ClosedXML.Excel;

namespace OutputForge.Workflow;

/// <summary>
/// One worksheet of a workflow report (compare, changes): a bold header row and rows of text.
/// Every cell is stored as text, so a value such as "=A1", "-3.2" or "@x" shows as written and is
/// never evaluated as a formula. Column widths are computed here from the longest text (ClosedXML's
/// AdjustToContents needs system fonts that Linux hosts lack).
/// </summary>
public static class ReportSheet
{
    private const int MaxWidth = 80;

    public static void Add(XLWorkbook workbook, string name, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows)
    {
        var sheet = workbook.Worksheets.Add(name);
        var all = new List<IReadOnlyList<string>> { header };
        all.AddRange(rows);
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
        for (var c = 0; c < header.Count; c++)
        {
            var longest = all.Max(row => c < row.Count ? row[c].Split('\n').Max(line => line.Length) : 0);
            sheet.Column(c + 1).Width = Math.Min(MaxWidth, Math.Max(8, longest + 2));
        }
    }

    /// <summary>Saves the workbook; a failure to write is an <see cref="IOException"/> naming the file.</summary>
    public static void Save(XLWorkbook workbook, string path)
    {
        var folder = Path.GetDirectoryName(Path.GetFullPath(path));
        if (folder is not null)
        {
            Directory.CreateDirectory(folder);
        }
        workbook.SaveAs(path);
    }
}
