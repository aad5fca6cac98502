using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Writes one table as a .docx: page header with the study line and "Page X of Y", the centered
/// title block, the table, its footnotes and the source line, in the page's one font.
/// </summary>
public sealed class WordTableRenderer : ITableRenderer
{
    /// <summary>Space between the title block and the table, and between the table and the footnotes: 6 pt.</summary>
    private const string BlockSpacingTwips = "120";

    public string Extension => ".docx";

    public void Write(TableDocument document, Stream output)
    {
        TableShape.Check(document);
        var geometry = WordPageGeometry.From(document.Page);
        var font = WordFontMetrics.From(document.Page);

        using var package = WordprocessingDocument.Create(output, WordprocessingDocumentType.Document);
        package.PackageProperties.Title = string.Join(" ", new[] { document.Heading }.Concat(document.Titles));
        var main = package.AddMainDocumentPart();

        var styles = main.AddNewPart<StyleDefinitionsPart>();
        styles.Styles = WordStyles.Create(document.Page.FontName, font.HalfPoints);

        var settings = main.AddNewPart<DocumentSettingsPart>();
        settings.Settings = new Settings(new Compatibility(new CompatibilitySetting
        {
            // Word 2013 and later layout rules, so Word does not open the file in compatibility mode.
            Name = CompatSettingNameValues.CompatibilityMode,
            Uri = "http://schemas.microsoft.com/office/word",
            Val = "15",
        }));

        var headerPart = main.AddNewPart<HeaderPart>();
        headerPart.Header = WordPageHeader.Create(document.StudyLine, geometry.TextWidthTwips);

        var body = new Body();
        foreach (var paragraph in TitleBlock(document))
            body.AppendChild(paragraph);
        body.AppendChild(new WordTableBuilder(document, geometry.TextWidthTwips, font).Build());
        for (int i = 0; i < document.Footnotes.Count; i++)
            body.AppendChild(WordText.Paragraph(document.Footnotes[i], Spaced(before: i == 0)));
        body.AppendChild(WordText.Paragraph(document.SourceLine, Spaced(before: document.Footnotes.Count == 0)));
        body.AppendChild(Section(geometry, main.GetIdOfPart(headerPart)));

        main.Document = new Document(body);
        main.Document.Save();
    }

    /// <summary>Heading, titles and population, centered and kept with the table.</summary>
    private static IEnumerable<Paragraph> TitleBlock(TableDocument document)
    {
        var lines = new[] { document.Heading }.Concat(document.Titles).Append(document.Population).ToList();
        for (int i = 0; i < lines.Count; i++)
        {
            var properties = new ParagraphProperties(new KeepNext());
            if (i == lines.Count - 1)
                properties.AppendChild(new SpacingBetweenLines { After = BlockSpacingTwips });
            properties.AppendChild(new Justification { Val = JustificationValues.Center });
            yield return WordText.Paragraph(lines[i], properties);
        }
    }

    private static ParagraphProperties Spaced(bool before) =>
        before ? new ParagraphProperties(new SpacingBetweenLines { Before = BlockSpacingTwips }) : new ParagraphProperties();

    private static SectionProperties Section(WordPageGeometry geometry, string headerPartId) => new(
        new HeaderReference { Type = HeaderFooterValues.Default, Id = headerPartId },
        new PageSize
        {
            Width = (UInt32Value)(uint)geometry.WidthTwips,
            Height = (UInt32Value)(uint)geometry.HeightTwips,
            Orient = geometry.Landscape ? PageOrientationValues.Landscape : PageOrientationValues.Portrait,
        },
        new PageMargin
        {
            Top = geometry.MarginTwips,
            Bottom = geometry.MarginTwips,
            Left = (UInt32Value)(uint)geometry.MarginTwips,
            Right = (UInt32Value)(uint)geometry.MarginTwips,
            Header = (UInt32Value)(uint)geometry.HeaderDistanceTwips,
            Footer = (UInt32Value)(uint)geometry.HeaderDistanceTwips,
            Gutter = 0U,
        });
}
