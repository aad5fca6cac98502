using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Wordprocessing;
using WordprocessingText = DocumentFormat.OpenXml.Wordprocessing.Text;

namespace OutputForge.Rendering.Word;

/// <summary>
/// The page header: the study line on the left and "Page X of Y" on the right, X and Y being the
/// PAGE and NUMPAGES fields (ECMA-376 Part 1, 17.16.5) so that Word and LibreOffice number the
/// pages themselves when they lay the table out.
/// </summary>
public static class WordPageHeader
{
    public static Header Create(string studyLine, int textWidthTwips)
    {
        var properties = new ParagraphProperties(
            new Tabs(new TabStop { Val = TabStopValues.Right, Position = textWidthTwips }));
        var paragraph = new Paragraph(properties, WordText.Run(studyLine), new Run(new TabChar()), WordText.Run("Page "));
        paragraph.Append(Field("PAGE"));
        paragraph.AppendChild(WordText.Run(" of "));
        paragraph.Append(Field("NUMPAGES"));
        return new Header(paragraph);
    }

    /// <summary>A complex field; "1" is only the cached result shown before the application updates it.</summary>
    private static IEnumerable<Run> Field(string instruction)
    {
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.Begin });
        yield return new Run(new FieldCode($" {instruction} ") { Space = SpaceProcessingModeValues.Preserve });
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.Separate });
        yield return new Run(new WordprocessingText("1"));
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.End });
    }
}
