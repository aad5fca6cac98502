using DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Rendering.Word;

/// <summary>The page footer: the table's source line(s), on every page, above a thin rule.</summary>
public static class WordPageFooter
{
    public static Footer Create(IEnumerable<string> lines)
    {
        var footer = new Footer();
        bool first = true;
        foreach (var line in lines)
        {
            var properties = new ParagraphProperties();
            if (first)
                properties.AppendChild(new ParagraphBorders(new TopBorder { Val = BorderValues.Single, Size = 4, Space = 1, Color = "000000" }));
            footer.AppendChild(WordText.Paragraph(line, properties));
            first = false;
        }
        if (first)
            footer.AppendChild(new Paragraph());
        return footer;
    }
}
