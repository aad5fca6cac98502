using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// The parts every OutputForge .docx shares (styles in the page's font, Word 2013 compatibility
/// settings, the title property) around a body made of sections. The last section's properties
/// move from its closing paragraph to the end of the body, where WordprocessingML expects the
/// final section's (ECMA-376 Part 1, 17.6.17), so no empty page follows the last table.
/// </summary>
public static class WordPackage
{
    public static void Write(Stream output, PageSettings page, string title, Func<MainDocumentPart, IReadOnlyList<OpenXmlElement>> content)
    {
        var font = WordFontMetrics.From(page);
        using var package = WordprocessingDocument.Create(output, WordprocessingDocumentType.Document);
        package.PackageProperties.Title = title;
        var main = package.AddMainDocumentPart();

        var styles = main.AddNewPart<StyleDefinitionsPart>();
        styles.Styles = WordStyles.Create(page.FontName, font.HalfPoints);

        var settings = main.AddNewPart<DocumentSettingsPart>();
        settings.Settings = new Settings(
            new Compatibility(new CompatibilitySetting
            {
                // Word 2013 and later layout rules, so Word does not open the file in compatibility mode.
                Name = CompatSettingNameValues.CompatibilityMode,
                Uri = "http://schemas.microsoft.com/office/word",
                Val = "15",
            }));

        var body = new Body();
        foreach (var element in content(main))
            body.AppendChild(element);
        if (body.LastChild is Paragraph closing && closing.ParagraphProperties?.GetFirstChild<SectionProperties>() is { } last)
        {
            last.Remove();
            closing.Remove();
            body.AppendChild(last);
        }
        main.Document = new Document(body);
        main.Document.Save();
    }
}
