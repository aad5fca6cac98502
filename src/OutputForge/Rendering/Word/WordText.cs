using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Wordprocessing;
using WordprocessingText = DocumentFormat.OpenXml.Wordprocessing.Text;

namespace OutputForge.Rendering.Word;

/// <summary>Runs of text; a "\n" in a layout text becomes a line break inside the paragraph.</summary>
public static class WordText
{
    public static Run Run(string text)
    {
        var run = new Run();
        var lines = CellLines.Split(text);
        for (int i = 0; i < lines.Length; i++)
        {
            if (i > 0)
                run.AppendChild(new Break());
            run.AppendChild(new WordprocessingText(lines[i]) { Space = SpaceProcessingModeValues.Preserve });
        }
        return run;
    }

    public static Paragraph Paragraph(string text, ParagraphProperties properties) =>
        new(properties, Run(text));
}
