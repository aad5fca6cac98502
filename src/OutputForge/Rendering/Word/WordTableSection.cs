using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// One table as one section of a Word document: its own page headers (study line, "Page X of Y",
/// and the "(continued)" line on the pages after its first) and footer (source line), the centered title block with a
/// bookmark on the heading, the table and its footnotes, the table's figure on a page of its own when
/// it has one, and the section's page setup. A
/// separate document holds one section; a combined document one per table, each on new pages.
/// </summary>
public static class WordTableSection
{
    /// <summary>Space between the title block and the table, and between the table and the footnotes: 6 pt.</summary>
    private const string BlockSpacingTwips = "120";

    /// <summary>The body elements of the table's section; the last one carries the section properties.</summary>
    public static IReadOnlyList<OpenXmlElement> Build(MainDocumentPart main, TableDocument document, string bookmark, int bookmarkId)
    {
        var geometry = WordPageGeometry.From(document.Page);
        var font = WordFontMetrics.From(document.Page);

        var firstHeader = main.AddNewPart<HeaderPart>();
        firstHeader.Header = WordPageHeader.First(document.StudyLine, geometry.TextWidthTwips);
        var headerPart = main.AddNewPart<HeaderPart>();
        headerPart.Header = WordPageHeader.Continuation(document.StudyLine, document.ContinuedLine, geometry.TextWidthTwips);
        var footerPart = main.AddNewPart<FooterPart>();
        footerPart.Footer = WordPageFooter.Create(document.FooterLines);

        var elements = new List<OpenXmlElement>();
        elements.AddRange(TitleBlock(document, bookmark, bookmarkId));
        elements.Add(new WordTableBuilder(document, geometry.TextWidthTwips, font).Build());
        for (int i = 0; i < document.Footnotes.Count; i++)
            elements.Add(WordText.Paragraph(document.Footnotes[i], Spaced(before: i == 0)));
        if (document.Figure is { } figure)
            elements.Add(WordFigure.Build(main, figure, geometry, pictureId: bookmarkId + 1));
        var closing = new Paragraph(new ParagraphProperties(
            Section(geometry, main.GetIdOfPart(firstHeader), main.GetIdOfPart(headerPart), main.GetIdOfPart(footerPart))));
        elements.Add(closing);
        return elements;
    }

    /// <summary>Heading, titles and population, centered and kept with the table.</summary>
    private static IEnumerable<Paragraph> TitleBlock(TableDocument document, string bookmark, int bookmarkId)
    {
        var lines = document.TitleLines;
        for (int i = 0; i < lines.Count; i++)
        {
            var properties = new ParagraphProperties(new KeepNext());
            if (i == lines.Count - 1)
                properties.AppendChild(new SpacingBetweenLines { After = BlockSpacingTwips });
            properties.AppendChild(new Justification { Val = JustificationValues.Center });
            var paragraph = WordText.Paragraph(lines[i], properties);
            if (i == 0)
            {
                var id = bookmarkId.ToString(System.Globalization.CultureInfo.InvariantCulture);
                paragraph.InsertAfter(new BookmarkStart { Name = bookmark, Id = id }, properties);
                paragraph.AppendChild(new BookmarkEnd { Id = id });
            }
            yield return paragraph;
        }
    }

    private static ParagraphProperties Spaced(bool before) =>
        before ? new ParagraphProperties(new SpacingBetweenLines { Before = BlockSpacingTwips }) : new ParagraphProperties();

    private static SectionProperties Section(WordPageGeometry geometry, string firstHeaderId, string headerPartId, string footerPartId) => new(
        new HeaderReference { Type = HeaderFooterValues.Default, Id = headerPartId },
        new HeaderReference { Type = HeaderFooterValues.First, Id = firstHeaderId },
        new FooterReference { Type = HeaderFooterValues.Default, Id = footerPartId },
        new FooterReference { Type = HeaderFooterValues.First, Id = footerPartId },
        new SectionType { Val = SectionMarkValues.NextPage },
        geometry.PageSize(),
            geometry.PageMargin(),
        new TitlePage());
}
