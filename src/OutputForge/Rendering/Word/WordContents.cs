using System.Globalization;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// The contents page of a combined document: one entry per table (heading, titles and population, a
/// dot leader, the page), each a hyperlink to the bookmark on the table's heading with a PAGEREF
/// field for the page (ECMA-376 Part 1, 17.16.5.45). The entries are written out, so they show
/// before any field update; the cached page numbers are estimates that Word (on printing or F9)
/// and LibreOffice replace with the laid-out pages.
/// </summary>
public static class WordContents
{
    public const string Title = "Contents";

    public static IReadOnlyList<OpenXmlElement> Build(MainDocumentPart main, IReadOnlyList<TableDocument> documents, IReadOnlyList<string> bookmarks, string studyLine)
    {
        var first = documents[0];
        var geometry = WordPageGeometry.From(first.Page);
        var headerPart = main.AddNewPart<HeaderPart>();
        headerPart.Header = WordPageHeader.First(studyLine, geometry.TextWidthTwips);

        var elements = new List<OpenXmlElement>
        {
            WordText.Paragraph(Title, new ParagraphProperties(
                new SpacingBetweenLines { After = "240" },
                new Justification { Val = JustificationValues.Center })),
        };
        int entriesPerPage = Math.Max(1, (int)((geometry.HeightTwips - 2 * geometry.MarginTwips) / (first.Page.FontSizePoints * 20 * 1.2)) - 4);
        int page = 1 + (documents.Count + entriesPerPage - 1) / entriesPerPage;
        for (int i = 0; i < documents.Count; i++)
        {
            elements.Add(Entry(documents[i], bookmarks[i], page, geometry.TextWidthTwips));
            page += WordPageEstimate.Pages(documents[i]);
        }
        elements.Add(new Paragraph(new ParagraphProperties(new SectionProperties(
            new HeaderReference { Type = HeaderFooterValues.Default, Id = main.GetIdOfPart(headerPart) },
            new SectionType { Val = SectionMarkValues.NextPage },
            geometry.PageSize(),
            geometry.PageMargin()))));
        return elements;
    }

    private static Paragraph Entry(TableDocument document, string bookmark, int estimatedPage, int textWidthTwips)
    {
        var text = $"{document.Heading}  {string.Join("; ", document.Titles.Append(document.Population).Where(t => t.Length > 0))}";
        var properties = new ParagraphProperties(
            new Tabs(new TabStop { Val = TabStopValues.Right, Leader = TabStopLeaderCharValues.Dot, Position = textWidthTwips }),
            new SpacingBetweenLines { After = "60" },
            // Long titles wrap under the title, not under the table number.
            new Indentation { Left = "720", Hanging = "720" });
        var link = new Hyperlink { Anchor = bookmark, History = true };
        link.AppendChild(WordText.Run(text));
        link.AppendChild(new Run(new TabChar()));
        foreach (var run in WordFields.Simple($"PAGEREF {bookmark} \\h", estimatedPage.ToString(CultureInfo.InvariantCulture)))
            link.AppendChild(run);
        return new Paragraph(properties, link);
    }
}
