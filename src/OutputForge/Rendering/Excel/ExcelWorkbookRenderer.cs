using ClosedXML.Excel;
using DocumentFormat.OpenXml.Packaging;
using OutputForge.Layout;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// Writes several tables into one .xlsx, one worksheet per table, in the given order; with
/// results, a last "results" sheet holds every number in long format (<see cref="ExcelResultsSheet"/>).
/// </summary>
public sealed class ExcelWorkbookRenderer
{
    public string Extension => ".xlsx";

    public void Write(IReadOnlyList<TableDocument> documents, Stream output, IReadOnlyList<Results.ResultRecord>? results = null)
    {
        ArgumentNullException.ThrowIfNull(documents);
        if (documents.Count == 0)
            throw new TableRenderException("A workbook needs at least one table.");
        // Check every table before writing, so that a bad table leaves no partial workbook behind.
        foreach (var document in documents)
            TableShape.Check(document);
        WriteInOrder(documents, output, results is null ? null : () => results);
    }

    /// <summary>
    /// Writes each table's sheet as soon as <paramref name="documents"/> yields it (the tables of a run can still be
    /// in the making), then the results sheet from <paramref name="results"/>, asked for after the last table.
    /// Each table is checked when it arrives.
    /// </summary>
    public void WriteInOrder(IEnumerable<TableDocument> documents, Stream output, Func<IReadOnlyList<Results.ResultRecord>>? results)
    {
        using var workbook = new XLWorkbook();
        var names = new ExcelSheetName();
        var written = new List<TableDocument>();
        foreach (var document in documents)
        {
            TableShape.Check(document);
            var sheet = workbook.Worksheets.Add(names.Next(document.TableId));
            new ExcelSheetWriter(document).Write(sheet);
            written.Add(document);
        }
        if (written.Count == 0)
            throw new TableRenderException("A workbook needs at least one table.");
        // The title goes into the package's core properties, which are written on saving.
        workbook.Properties.Title = written.Count == 1
            ? string.Join(" ", new[] { written[0].Heading }.Concat(written[0].Titles))
            : string.Join(", ", written.Select(d => d.Heading));
        var records = results?.Invoke();
        var resultsSheet = records is null ? null : names.Next(ExcelResultsSheet.Name);
        if (records is not null)
            ExcelResultsSheet.WriteFrame(workbook.Worksheets.Add(resultsSheet), records);
        using var package = new MemoryStream();
        workbook.SaveAs(package);
        using (var saved = SpreadsheetDocument.Open(package, isEditable: true))
        {
            ExcelPrintTitles.MakeAbsolute(saved);
            if (records is not null)
                ExcelResultsRows.Fill(saved, resultsSheet!, records);
        }
        package.Position = 0;
        package.CopyTo(output);
    }
}
