using DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Rendering.Word;

/// <summary>
/// The page headers of a table's section: the study line on the left and "Page X of Y" on the
/// right, X and Y being the PAGE and NUMPAGES fields (ECMA-376 Part 1, 17.16.5) so that Word and
/// LibreOffice number the pages themselves when they lay the table out. The section's first page
/// has this line only (its title block follows); every later page has the table's "(continued)"
/// line under it: the section uses a different first-page header (w:titlePg, 17.10.6), which
/// Word and LibreOffice both honour, where an IF field on PAGE is not evaluated by LibreOffice.
/// </summary>
public static class WordPageHeader
{
    public static Header First(string studyLine, int textWidthTwips) => new(PageLine(studyLine, textWidthTwips));

    public static Header Continuation(string studyLine, string continuedLine, int textWidthTwips) => new(
        PageLine(studyLine, textWidthTwips),
        WordText.Paragraph(continuedLine, new ParagraphProperties(new Justification { Val = JustificationValues.Center })));

    private static Paragraph PageLine(string studyLine, int textWidthTwips)
    {
        var properties = new ParagraphProperties(
            new Tabs(new TabStop { Val = TabStopValues.Right, Position = textWidthTwips }));
        var line = new Paragraph(properties, WordText.Run(studyLine), new Run(new TabChar()), WordText.Run("Page "));
        line.Append(WordFields.Simple("PAGE", "1"));
        line.AppendChild(WordText.Run(" of "));
        line.Append(WordFields.Simple("NUMPAGES", "1"));
        return line;
    }
}
