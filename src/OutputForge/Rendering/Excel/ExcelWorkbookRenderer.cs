using ClosedXML.Excel;
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

        using var workbook = new XLWorkbook();
        workbook.Properties.Title = documents.Count == 1
            ? string.Join(" ", new[] { documents[0].Heading }.Concat(documents[0].Titles))
            : string.Join(", ", documents.Select(d => d.Heading));

        var names = new ExcelSheetName();
        foreach (var document in documents)
        {
            var sheet = workbook.Worksheets.Add(names.Next(document.TableId));
            new ExcelSheetWriter(document).Write(sheet);
        }
        if (results is not null)
            ExcelResultsSheet.Write(workbook.Worksheets.Add(names.Next(ExcelResultsSheet.Name)), results);
        using var package = new MemoryStream();
        workbook.SaveAs(package);
        ExcelPrintTitles.MakeAbsolute(package);
        package.Position = 0;
        package.CopyTo(output);
    }
}
