using DocumentFormat.OpenXml.Packaging;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Writes one table as a .docx: page header with the study line, "Page X of Y" and "(continued)"
/// on later pages, the centered title block, the table, its footnotes, and the source line in the
/// page footer, in the page's one font.
/// </summary>
public sealed class WordTableRenderer : ITableRenderer
{
    public string Extension => ".docx";

    public void Write(TableDocument document, Stream output)
    {
        TableShape.Check(document);
        var title = string.Join(" ", new[] { document.Heading }.Concat(document.Titles));
        WordPackage.Write(output, document.Page, title, main =>
            WordTableSection.Build(main, document, WordBookmark.ForTable(document.TableId), bookmarkId: 0));
    }
}
