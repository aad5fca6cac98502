using ClosedXML.Excel;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Validation;
using OutputForge.Layout;
using OutputForge.Rendering.Text;

namespace OutputForge.Tests.Rendering;

/// <summary>Unusual but legal tables: every renderer writes them, and the Word file stays valid.</summary>
public sealed class RendererEdgeCaseTests
{
    public static TheoryData<string> Cases => new() { "label column only", "no header rows", "no body rows", "no titles or footnotes", "not a finite number" };

    private static TableDocument Build(string name)
    {
        var table = ResponderTableFixture.Responders();
        return name switch
        {
            "label column only" => table with
            {
                Columns = [new LayoutColumn("label", CellAlignment.Left)],
                HeaderRows = [new HeaderRow([new HeaderCell("Parameter")])],
                Rows = [new BodyRow("Subjects screened", 0, []), new BodyRow("Subjects randomized", 1, [])],
            },
            "no header rows" => table with { HeaderRows = [] },
            "no body rows" => table with { Rows = [] },
            "no titles or footnotes" => table with { Titles = [], Footnotes = [], Population = "" },
            _ => table with { Rows = [new BodyRow("Ratio", 0, [new LayoutCell("NE", double.NaN, "0.00"), new LayoutCell("NE", double.PositiveInfinity, "0.00"), LayoutCell.Empty])] },
        };
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Word_file_is_valid(string name)
    {
        using var word = new WordDocumentReader(Build(name));

        var errors = new OpenXmlValidator(FileFormatVersions.Office2010).Validate(word.Package).Select(e => e.Description).ToList();
        Assert.True(errors.Count == 0, string.Join("\n", errors));
        Assert.Single(word.Body.Elements<DocumentFormat.OpenXml.Wordprocessing.Table>());
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Excel_file_opens_with_every_text_in_place(string name)
    {
        var document = Build(name);
        using var excel = new ExcelWorkbookReader(document);
        var texts = excel.Sheet.CellsUsed().Select(c => c.GetString()).ToHashSet();

        Assert.Contains(document.Heading, texts);
        Assert.Contains(document.SourceLine, texts);
        Assert.All(document.Rows.Where(r => r.Kind != RowKind.Blank), r => Assert.Contains(r.Label, texts));
        Assert.DoesNotContain(excel.Sheet.CellsUsed(), c => c.DataType == XLDataType.Number && !double.IsFinite(c.GetDouble()));
        int ruledAbove = excel.Sheet.RowsUsed().Count(r => r.Cell(1).Style.Border.TopBorder == XLBorderStyleValues.Thin);
        int ruledBelow = excel.Sheet.RowsUsed().Count(r => r.Cell(1).Style.Border.BottomBorder == XLBorderStyleValues.Thin);
        Assert.Equal(1, ruledAbove);
        Assert.Equal(document.HeaderRows.Count > 0 && document.Rows.Count > 0 ? 2 : 1, ruledBelow);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Text_preview_has_three_rules_or_two_without_header(string name)
    {
        var document = Build(name);
        var lines = new TextTableRenderer().Render(document).Split('\n');
        // Full rules start at the left edge; the underline of a spanning header starts with blanks.
        int rules = lines.Count(l => l.Length > 0 && l.All(c => c == '-'));

        Assert.Equal(document.HeaderRows.Count > 0 ? 3 : 2, rules);
        Assert.Equal(document.SourceLine, lines[^2]);
    }
}
