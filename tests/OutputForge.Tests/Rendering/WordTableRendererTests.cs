using System.Globalization;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Validation;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Word;

namespace OutputForge.Tests.Rendering;

public sealed class WordTableRendererTests
{
    [Fact]
    public void Every_header_and_body_text_appears_in_order_in_its_own_cell()
    {
        var document = ResponderTableFixture.Responders();
        using var word = new WordDocumentReader(document);

        var expected = document.HeaderRows.Select(h => h.Cells.Select(c => c.Text).ToList())
            .Concat(document.Rows.Select(r => r.Cells.Select(c => c.Text).Prepend(r.Label).ToList()))
            .ToList();
        var actual = word.Table.Elements<TableRow>()
            .Select(row => row.Elements<TableCell>().Select(WordDocumentReader.TextOf).ToList())
            .ToList();

        Assert.Equal(expected.Count, actual.Count);
        for (int r = 0; r < expected.Count; r++)
            Assert.Equal(expected[r], actual[r]);
    }

    [Fact]
    public void Title_block_is_centered_above_the_table_footnotes_follow_it_and_the_source_is_in_the_footer()
    {
        var document = ResponderTableFixture.Responders();
        using var word = new WordDocumentReader(document);

        var blocks = word.Body.ChildElements.Where(e => e is Paragraph or Table).ToList();
        var titles = blocks.TakeWhile(e => e is Paragraph).Cast<Paragraph>().ToList();
        Assert.Equal(new[] { "Table 14.2.1", "Proportion of Responders at Week 12", "Primary Efficacy Analysis", "Intent-to-Treat Population" },
            titles.Select(WordDocumentReader.TextOf));
        Assert.All(titles, p => Assert.Equal(JustificationValues.Center, p.ParagraphProperties!.Justification!.Val!.Value));

        var after = blocks.SkipWhile(e => e is Paragraph).Skip(1).Cast<Paragraph>().Select(WordDocumentReader.TextOf).ToList();
        Assert.Equal(document.Footnotes, after);
        // The source line is in the page footer, on every page.
        var footer = Assert.Single(word.Package.MainDocumentPart!.FooterParts).Footer;
        Assert.Equal([document.SourceLine], footer.Elements<Paragraph>().Select(WordDocumentReader.TextOf));
        Assert.NotNull(word.Body.GetFirstChild<SectionProperties>()!.GetFirstChild<FooterReference>());
    }

    [Fact]
    public void Header_rows_repeat_on_each_page_and_no_row_splits()
    {
        using var word = new WordDocumentReader(ResponderTableFixture.LongTable());
        var rows = word.Table.Elements<TableRow>().ToList();

        Assert.Equal(2 + 200, rows.Count);
        Assert.All(rows.Take(2), r => Assert.NotNull(r.TableRowProperties!.GetFirstChild<TableHeader>()));
        Assert.All(rows.Skip(2), r => Assert.Null(r.TableRowProperties!.GetFirstChild<TableHeader>()));
        Assert.All(rows, r => Assert.NotNull(r.TableRowProperties!.GetFirstChild<CantSplit>()));
    }

    [Fact]
    public void Page_header_has_the_study_line_and_page_x_of_y_fields()
    {
        using var word = new WordDocumentReader(ResponderTableFixture.Responders());
        var reference = word.Body.GetFirstChild<SectionProperties>()!.Elements<HeaderReference>().Single(h => h.Type!.Value == HeaderFooterValues.Default);
        var headerPart = (HeaderPart)word.Package.MainDocumentPart!.GetPartById(reference.Id!);
        var header = headerPart.Header;

        Assert.StartsWith("Study QF217-301", WordDocumentReader.TextOf(header));
        var first = header.Elements<Paragraph>().First();
        var instructions = first.Descendants<FieldCode>().Select(f => f.Text.Trim()).ToList();
        Assert.Equal(new[] { "PAGE", "NUMPAGES" }, instructions);
        Assert.Equal(6, first.Descendants<FieldChar>().Count());
        var text = string.Concat(first.Descendants<Text>().Select(t => t.Text));
        Assert.Contains("Page 1 of 1", text);
        Assert.Equal("Table 14.2.1 (continued)", WordDocumentReader.TextOf(header.Elements<Paragraph>().ElementAt(1)));
        Assert.Single(word.Body.Descendants<BookmarkStart>(), b => b.Name == "Table_14_2_1");
    }

    [Fact]
    public void Spanning_header_uses_grid_span_and_is_underlined()
    {
        using var word = new WordDocumentReader(ResponderTableFixture.Responders());
        var firstRow = word.Table.Elements<TableRow>().First().Elements<TableCell>().ToList();

        Assert.Equal(3, firstRow.Count);
        var span = firstRow[2];
        Assert.Equal("QF-217", WordDocumentReader.TextOf(span));
        Assert.Equal(2, span.TableCellProperties!.GridSpan!.Val!.Value);
        Assert.Equal(BorderValues.Single, span.TableCellProperties.TableCellBorders!.BottomBorder!.Val!.Value);
        Assert.Null(firstRow[1].TableCellProperties!.TableCellBorders!.BottomBorder);
    }

    [Fact]
    public void Only_horizontal_rules_above_and_below_the_header_and_below_the_last_row()
    {
        using var word = new WordDocumentReader(ResponderTableFixture.Responders());
        var rows = word.Table.Elements<TableRow>().ToList();

        static bool Has<T>(TableCell c) where T : BorderType =>
            c.TableCellProperties?.TableCellBorders?.GetFirstChild<T>()?.Val?.Value == BorderValues.Single;

        Assert.All(rows[0].Elements<TableCell>(), c => Assert.True(Has<TopBorder>(c)));
        Assert.All(rows[1].Elements<TableCell>(), c => Assert.True(Has<BottomBorder>(c)));
        Assert.All(rows[^1].Elements<TableCell>(), c => Assert.True(Has<BottomBorder>(c)));
        Assert.All(rows.Skip(2).SkipLast(1).SelectMany(r => r.Elements<TableCell>()),
            c => Assert.False(Has<TopBorder>(c) || Has<BottomBorder>(c)));
        Assert.DoesNotContain(word.Table.Descendants<LeftBorder>(), b => b.Val?.Value != BorderValues.Nil);
        Assert.DoesNotContain(word.Table.Descendants<InsideVerticalBorder>(), b => b.Val?.Value != BorderValues.Nil);
        Assert.Empty(word.Table.Descendants<Shading>());
    }

    [Fact]
    public void Labels_are_indented_by_level_and_values_follow_the_column_alignment()
    {
        var document = ResponderTableFixture.Responders();
        using var word = new WordDocumentReader(document);
        var bodyRows = word.Table.Elements<TableRow>().Skip(2).ToList();

        for (int r = 0; r < document.Rows.Count; r++)
        {
            var cells = bodyRows[r].Elements<TableCell>().ToList();
            var indentation = cells[0].Descendants<Indentation>().Single();
            int firstLine = int.Parse(indentation.Left!.Value!, CultureInfo.InvariantCulture) - int.Parse(indentation.Hanging!.Value!, CultureInfo.InvariantCulture);
            Assert.Equal(document.Rows[r].Indent * WordTableBuilder.IndentTwips, firstLine);
            Assert.Equal(WordTableBuilder.ContinuationLevels * WordTableBuilder.IndentTwips, int.Parse(indentation.Hanging!.Value!, CultureInfo.InvariantCulture));
            Assert.Equal(JustificationValues.Left, cells[0].Descendants<Justification>().Single().Val!.Value);
            Assert.All(cells.Skip(1), c => Assert.Equal(JustificationValues.Center, c.Descendants<Justification>().Single().Val!.Value));
        }
    }

    [Fact]
    public void Columns_fill_the_text_width_and_the_label_column_fits_its_longest_label()
    {
        var document = ResponderTableFixture.LongTable();
        using var word = new WordDocumentReader(document);
        var widths = word.Table.GetFirstChild<TableGrid>()!.Elements<GridColumn>().Select(g => int.Parse(g.Width!.Value!, CultureInfo.InvariantCulture)).ToList();

        // Letter landscape with 1 inch margins: 11 in - 2 in = 9 in = 12960 twips.
        Assert.Equal(12960, widths.Sum());
        // "Adverse event term 01.1": 23 characters of 9 pt Courier New (0.6 em = 108 twips) after one 216-twip indent.
        Assert.True(widths[0] >= 216 + 23 * 108 + 2 * WordTableBuilder.CellMarginTwips, $"label column {widths[0]} twips");
        Assert.Equal(widths[1], widths[2]);
        Assert.InRange(widths[3] - widths[1], 0, 2);
    }

    [Fact]
    public void Long_labels_wrap_instead_of_taking_the_page()
    {
        var document = ResponderTableFixture.Responders() with
        {
            Rows = [new BodyRow(new string('x', 300), 0, [LayoutCell.Empty, LayoutCell.Empty, LayoutCell.Empty])],
        };
        using var word = new WordDocumentReader(document);
        var widths = word.Table.GetFirstChild<TableGrid>()!.Elements<GridColumn>().Select(g => int.Parse(g.Width!.Value!, CultureInfo.InvariantCulture)).ToList();

        Assert.Equal((int)(12960 * WordColumnWidths.MaxLabelShare), widths[0]);
    }

    [Theory]
    [InlineData(PaperSize.Letter, PageOrientation.Landscape, 15840, 12240)]
    [InlineData(PaperSize.Letter, PageOrientation.Portrait, 12240, 15840)]
    [InlineData(PaperSize.A4, PageOrientation.Landscape, 16838, 11906)]
    [InlineData(PaperSize.A4, PageOrientation.Portrait, 11906, 16838)]
    public void Page_size_orientation_and_margins_come_from_the_page_settings(PaperSize paper, PageOrientation orientation, int width, int height)
    {
        var page = new PageSettings(paper, orientation, "Courier New", 9, 0.75);
        using var word = new WordDocumentReader(ResponderTableFixture.Responders(page));
        var section = word.Body.GetFirstChild<SectionProperties>()!;
        var size = section.GetFirstChild<PageSize>()!;
        var margin = section.GetFirstChild<PageMargin>()!;

        Assert.Equal((uint)width, size.Width!.Value);
        Assert.Equal((uint)height, size.Height!.Value);
        Assert.Equal(orientation == PageOrientation.Landscape ? PageOrientationValues.Landscape : PageOrientationValues.Portrait, size.Orient!.Value);
        Assert.Equal(1080, margin.Top!.Value);
        Assert.Equal(1080u, margin.Left!.Value);
    }

    [Fact]
    public void One_font_and_size_for_all_text()
    {
        var page = PageSettings.Default with { FontName = "Arial", FontSizePoints = 8.5 };
        using var word = new WordDocumentReader(ResponderTableFixture.Responders(page));
        var defaults = word.Package.MainDocumentPart!.StyleDefinitionsPart!.Styles!.DocDefaults!.RunPropertiesDefault!.RunPropertiesBaseStyle!;

        Assert.Equal("Arial", defaults.RunFonts!.Ascii!.Value);
        Assert.Equal("Arial", defaults.RunFonts.HighAnsi!.Value);
        Assert.Equal("17", defaults.FontSize!.Val!.Value);
        Assert.Empty(word.Body.Descendants<RunFonts>());
        Assert.Empty(word.Body.Descendants<FontSize>());
    }

    public static TheoryData<string> ValidationCases => new() { "responders", "long", "a4-portrait-arial", "no-header-rows", "no-body-rows" };

    [Theory]
    [MemberData(nameof(ValidationCases))]
    public void Open_xml_validator_reports_no_errors(string name)
    {
        var document = name switch
        {
            "long" => ResponderTableFixture.LongTable(),
            "a4-portrait-arial" => ResponderTableFixture.Responders(new PageSettings(PaperSize.A4, PageOrientation.Portrait, "Arial", 10, 1)),
            "no-header-rows" => ResponderTableFixture.Responders() with { HeaderRows = [] },
            "no-body-rows" => ResponderTableFixture.Responders() with { Rows = [], Footnotes = [] },
            _ => ResponderTableFixture.Responders(),
        };
        using var word = new WordDocumentReader(document);

        foreach (var version in new[] { FileFormatVersions.Office2010, FileFormatVersions.Microsoft365 })
        {
            var errors = new OpenXmlValidator(version).Validate(word.Package)
                .Select(e => $"{version}: {e.Description} at {e.Path?.XPath}")
                .ToList();
            Assert.True(errors.Count == 0, string.Join("\n", errors));
        }
    }

    [Fact]
    public void Header_spans_that_do_not_cover_the_columns_are_a_clear_error()
    {
        var document = ResponderTableFixture.Responders() with
        {
            HeaderRows = [new HeaderRow([new HeaderCell(""), new HeaderCell("QF-217", Span: 2)])],
        };

        var error = Assert.Throws<TableRenderException>(() => new WordTableRenderer().Write(document, new MemoryStream()));
        Assert.Equal("Table 14.2.1: header row 1 covers 3 columns but the table has 4.", error.Message);
    }
}
