using DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Document defaults: one font and size for all text, single line spacing, no space after
/// paragraphs, so that every paragraph and table cell of the table looks the same.
/// </summary>
public static class WordStyles
{
    public static Styles Create(string fontName, int halfPoints)
    {
        var size = halfPoints.ToString(System.Globalization.CultureInfo.InvariantCulture);
        var runDefaults = new RunPropertiesBaseStyle(
            new RunFonts { Ascii = fontName, HighAnsi = fontName, ComplexScript = fontName, EastAsia = fontName },
            new FontSize { Val = size },
            new FontSizeComplexScript { Val = size },
            new Languages { Val = "en-US" });
        var paragraphDefaults = new ParagraphPropertiesBaseStyle(
            new SpacingBetweenLines { Before = "0", After = "0", Line = "240", LineRule = LineSpacingRuleValues.Auto });
        var normal = new Style(new StyleName { Val = "Normal" }, new PrimaryStyle())
        {
            Type = StyleValues.Paragraph,
            StyleId = "Normal",
            Default = true,
        };
        return new Styles(
            new DocDefaults(new RunPropertiesDefault(runDefaults), new ParagraphPropertiesDefault(paragraphDefaults)),
            normal);
    }
}
