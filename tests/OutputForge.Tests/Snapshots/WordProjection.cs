using System.Globalization;
using System.Text;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// A text projection of a .docx for snapshots: document font, each section's page setup, page
/// headers and footers, every body paragraph (alignment, keep-with-next, text) and every table
/// (grid, row flags, and per cell: span, alignment, indentation, borders, text). Fields print as
/// {INSTRUCTION}; no-break spaces (the number-alignment padding) print as '·' so alignment shows.
/// </summary>
public static class WordProjection
{
    public static string Of(string path)
    {
        using var document = WordprocessingDocument.Open(path, false);
        var main = document.MainDocumentPart!;
        var text = new StringBuilder();
        var defaults = main.StyleDefinitionsPart!.Styles!.DocDefaults!.RunPropertiesDefault!.RunPropertiesBaseStyle!;
        text.Append(CultureInfo.InvariantCulture, $"font: {defaults.RunFonts!.Ascii} {defaults.FontSize!.Val} half-points\n");
        foreach (var element in main.Document.Body!.ChildElements)
        {
            switch (element)
            {
                case Paragraph paragraph:
                    Paragraph(text, paragraph, "");
                    if (paragraph.ParagraphProperties?.GetFirstChild<SectionProperties>() is { } inner)
                        Section(text, main, inner);
                    break;
                case Table table:
                    Table(text, table);
                    break;
                case SectionProperties section:
                    Section(text, main, section);
                    break;
            }
        }
        return text.ToString();
    }

    private static void Section(StringBuilder text, MainDocumentPart main, SectionProperties section)
    {
        var size = section.GetFirstChild<PageSize>()!;
        var margin = section.GetFirstChild<PageMargin>()!;
        text.Append(CultureInfo.InvariantCulture, $"section: page {size.Width}x{size.Height} {size.Orient?.Value.ToString() ?? "portrait"}, margins {margin.Top}/{margin.Bottom}/{margin.Left}/{margin.Right}, header {margin.Header}, footer {margin.Footer}")
            .Append(section.GetFirstChild<TitlePage>() is null ? "" : ", own first-page header")
            .Append('\n');
        foreach (var reference in section.Elements<HeaderReference>())
        {
            var header = ((HeaderPart)main.GetPartById(reference.Id!)).Header;
            foreach (var paragraph in header.Elements<Paragraph>())
                Paragraph(text, paragraph, $"  header {reference.Type!.Value}: ");
        }
        foreach (var reference in section.Elements<FooterReference>())
        {
            var footer = ((FooterPart)main.GetPartById(reference.Id!)).Footer;
            foreach (var paragraph in footer.Elements<Paragraph>())
                Paragraph(text, paragraph, $"  footer {reference.Type!.Value}: ");
        }
    }

    private static void Paragraph(StringBuilder text, Paragraph paragraph, string prefix)
    {
        var content = TextOf(paragraph);
        if (content.Length == 0 && paragraph.ParagraphProperties?.GetFirstChild<SectionProperties>() is not null)
            return;
        text.Append(prefix).Append("p").Append(Flags(paragraph.ParagraphProperties)).Append(": ").Append(content).Append('\n');
    }

    private static void Table(StringBuilder text, Table table)
    {
        var grid = table.GetFirstChild<TableGrid>()!.Elements<GridColumn>().Select(g => g.Width!.Value);
        text.Append("table grid ").Append(string.Join(" ", grid)).Append('\n');
        foreach (var row in table.Elements<TableRow>())
        {
            var properties = row.TableRowProperties;
            var flags = new List<string>();
            if (properties?.GetFirstChild<TableHeader>() is not null)
                flags.Add("repeats");
            if (properties?.GetFirstChild<CantSplit>() is not null)
                flags.Add("cantSplit");
            text.Append("  row [").Append(string.Join(",", flags)).Append("]\n");
            foreach (var cell in row.Elements<TableCell>())
            {
                var cellProperties = cell.TableCellProperties;
                var cellFlags = new List<string>();
                if (cellProperties?.GetFirstChild<GridSpan>() is { } span)
                    cellFlags.Add($"span {span.Val}");
                if (cellProperties?.GetFirstChild<TableCellBorders>() is { } borders)
                {
                    if (borders.GetFirstChild<TopBorder>() is { } top)
                        cellFlags.Add($"top {top.Val!.Value} {top.Size}");
                    if (borders.GetFirstChild<BottomBorder>() is { } bottom)
                        cellFlags.Add($"bottom {bottom.Val!.Value} {bottom.Size}");
                }
                if (cellProperties?.GetFirstChild<TableCellVerticalAlignment>() is { } vertical)
                    cellFlags.Add(vertical.Val!.Value.ToString());
                var paragraphs = cell.Elements<Paragraph>().ToList();
                text.Append("    cell [").Append(string.Join(", ", cellFlags)).Append(']')
                    .Append(Flags(paragraphs.FirstOrDefault()?.ParagraphProperties)).Append(": ")
                    .Append(string.Join(" / ", paragraphs.Select(TextOf))).Append('\n');
            }
        }
    }

    private static string Flags(ParagraphProperties? properties)
    {
        if (properties is null)
            return "";
        var flags = new List<string>();
        if (properties.Justification?.Val is { } justification)
            flags.Add(justification.Value.ToString());
        if (properties.KeepNext is not null)
            flags.Add("keepNext");
        if (properties.Indentation is { } indentation)
            flags.Add($"indent {indentation.Left}/{indentation.Hanging}");
        if (properties.SpacingBetweenLines is { } spacing && (spacing.Before is not null || spacing.After is not null))
            flags.Add($"space {spacing.Before ?? "0"}/{spacing.After ?? "0"}");
        if (properties.ParagraphBorders is not null)
            flags.Add("rule above");
        if (properties.Tabs is { } tabs)
            flags.Add("tabs " + string.Join(",", tabs.Elements<TabStop>().Select(t => $"{t.Val!.Value}@{t.Position}")));
        return flags.Count == 0 ? "" : " (" + string.Join(", ", flags) + ")";
    }

    /// <summary>A paragraph's text with fields as {INSTRUCTION} (their cached results left out), tabs as →, breaks as ↵.</summary>
    private static string TextOf(OpenXmlElement paragraph)
    {
        var text = new StringBuilder();
        int depth = 0;
        var instructions = new Stack<StringBuilder>();
        bool[] inResult = new bool[16];
        foreach (var element in paragraph.Descendants())
        {
            switch (element)
            {
                case FieldChar { FieldCharType.Value: var type } when type == FieldCharValues.Begin:
                    depth++;
                    instructions.Push(new StringBuilder());
                    inResult[depth] = false;
                    break;
                case FieldChar { FieldCharType.Value: var type } when type == FieldCharValues.Separate:
                    inResult[depth] = true;
                    break;
                case FieldChar { FieldCharType.Value: var type } when type == FieldCharValues.End:
                    var instruction = "{" + instructions.Pop().ToString().Trim() + "}";
                    depth--;
                    (depth == 0 ? text : instructions.Peek()).Append(instruction);
                    break;
                case FieldCode code:
                    instructions.Peek().Append(code.Text);
                    break;
                case Text t when depth == 0 || !inResult[depth]:
                    (depth == 0 ? text : instructions.Peek()).Append(t.Text);
                    break;
                case TabChar when depth == 0:
                    text.Append('→');
                    break;
                case Break when depth == 0:
                    text.Append('↵');
                    break;
            }
        }
        return text.ToString().Replace('\u00A0', '·');
    }
}
