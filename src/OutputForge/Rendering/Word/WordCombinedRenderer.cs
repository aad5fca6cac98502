using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// All tables of a run in one .docx: a contents page, then each table in its own section
/// starting on a new page, with its own page setup, headers ("(continued)" on its later pages)
/// and source-line footer. Pages are numbered through the whole document. The caller gives the
/// tables in print order (<see cref="TableIdOrder"/>).
/// </summary>
public sealed class WordCombinedRenderer
{
    public string Extension => ".docx";

    public void Write(IReadOnlyList<TableDocument> documents, Stream output)
    {
        ArgumentNullException.ThrowIfNull(documents);
        if (documents.Count == 0)
            throw new TableRenderException("A combined document needs at least one table.");
        foreach (var document in documents)
            TableShape.Check(document);

        var bookmarks = documents.Select((d, i) => WordBookmark.ForTable(d.TableId, i + 1)).ToList();
        var title = $"{documents[0].StudyLine}: {string.Join(", ", documents.Select(d => d.Heading))}";
        WordPackage.Write(output, documents[0].Page, title, main =>
        {
            var elements = new List<DocumentFormat.OpenXml.OpenXmlElement>(WordContents.Build(main, documents, bookmarks, documents[0].StudyLine));
            for (int i = 0; i < documents.Count; i++)
                elements.AddRange(WordTableSection.Build(main, documents[i], bookmarks[i], bookmarkId: i + 1));
            return elements;
        });
    }
}
