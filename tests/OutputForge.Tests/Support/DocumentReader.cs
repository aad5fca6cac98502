using ClosedXML.Excel;
using DocumentFormat.OpenXml.Packaging;
using W = DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Tests.Support;

/// <summary>Reads back the cells of the written documents, as a reviewer's software would.</summary>
public static class DocumentReader
{
    /// <summary>Every row of the first table of a .docx, as the texts of its cells.</summary>
    public static List<List<string>> WordTableRows(string path)
    {
        using var document = WordprocessingDocument.Open(path, false);
        var table = document.MainDocumentPart!.Document.Body!.Elements<W.Table>().First();
        return table.Elements<W.TableRow>()
            .Select(row => row.Elements<W.TableCell>().Select(CellText).ToList())
            .ToList();
    }

    /// <summary>All paragraphs of a .docx body outside tables.</summary>
    public static List<string> WordParagraphs(string path)
    {
        using var document = WordprocessingDocument.Open(path, false);
        return document.MainDocumentPart!.Document.Body!.Elements<W.Paragraph>().Select(p => p.InnerText).ToList();
    }

    /// <summary>All paragraphs of the page footers of a .docx.</summary>
    public static List<string> WordFooterParagraphs(string path)
    {
        using var document = WordprocessingDocument.Open(path, false);
        return document.MainDocumentPart!.FooterParts.SelectMany(f => f.Footer.Elements<W.Paragraph>()).Select(p => p.InnerText).ToList();
    }

    /// <summary>The text of every page footer of a .docx (the source line lives there).</summary>
    public static string WordFooterText(string path)
    {
        using var document = WordprocessingDocument.Open(path, false);
        return string.Join("\n", document.MainDocumentPart!.FooterParts.Select(f => f.Footer.InnerText));
    }

    private static string CellText(W.TableCell cell) =>
        string.Join("\n", cell.Elements<W.Paragraph>().Select(p => p.InnerText)).Trim();

    /// <summary>The first cell of the first sheet whose text equals <paramref name="label"/>, trimmed.</summary>
    public static IXLCell FindLabel(IXLWorksheet sheet, string label) =>
        sheet.CellsUsed().First(c => c.GetString().Trim() == label);
}
