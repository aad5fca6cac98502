using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;
using OutputForge.Rendering.Word;

namespace OutputForge.Tests.Rendering;

/// <summary>Renders a table to .docx in memory and reopens it with the Open XML SDK for inspection.</summary>
public sealed class WordDocumentReader : IDisposable
{
    private readonly MemoryStream _stream = new();

    public WordDocumentReader(TableDocument document)
    {
        new WordTableRenderer().Write(document, _stream);
        _stream.Position = 0;
        Package = WordprocessingDocument.Open(_stream, false);
    }

    public WordprocessingDocument Package { get; }

    public Body Body => Package.MainDocumentPart!.Document.Body!;

    public Table Table => Body.Elements<Table>().Single();

    /// <summary>A paragraph's or cell's text, with line breaks as "\n".</summary>
    public static string TextOf(OpenXmlElement element)
    {
        var parts = element.Descendants().Select(e => e switch
        {
            Text t => t.Text,
            Break => "\n",
            _ => null,
        });
        return string.Concat(parts.Where(p => p is not null));
    }

    public void Dispose()
    {
        Package.Dispose();
        _stream.Dispose();
    }
}
