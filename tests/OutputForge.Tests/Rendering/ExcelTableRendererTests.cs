using System.IO.Compression;
using ClosedXML.Excel;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Validation;
using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Excel;

namespace OutputForge.Tests.Rendering;

public sealed class ExcelTableRendererTests
{
    // Row numbers of the responder table: heading, 2 titles, population, blank, 2 header rows.
    private const int FirstHeaderRow = 6;
    private const int LastHeaderRow = 7;
    private const int FirstBodyRow = 8;

    [Fact]
    public void Sheet_is_named_after_the_table_and_the_title_lines_are_merged_and_centered()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders());
        var sheet = excel.Sheet;

        Assert.Equal("14.2.1", sheet.Name);
        string[] titles = ["Table 14.2.1", "Proportion of Responders at Week 12", "Primary Efficacy Analysis", "Intent-to-Treat Population"];
        for (int r = 0; r < titles.Length; r++)
        {
            var cell = sheet.Cell(r + 1, 1);
            Assert.Equal(titles[r], cell.GetString());
            Assert.Equal($"A{r + 1}:D{r + 1}", cell.MergedRange().RangeAddress.ToString());
            Assert.Equal(XLAlignmentHorizontalValues.Center, cell.Style.Alignment.Horizontal);
        }
        Assert.True(sheet.Row(5).IsEmpty());
    }

    [Fact]
    public void Header_rows_are_in_place_with_the_spanning_cell_merged_and_underlined()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders());
        var sheet = excel.Sheet;

        var span = sheet.Cell(FirstHeaderRow, 3);
        Assert.Equal("QF-217", span.GetString());
        Assert.Equal("C6:D6", span.MergedRange().RangeAddress.ToString());
        Assert.Equal(XLBorderStyleValues.Thin, span.Style.Border.BottomBorder);
        Assert.Equal(XLBorderStyleValues.None, sheet.Cell(FirstHeaderRow, 2).Style.Border.BottomBorder);
        Assert.Equal(new[] { "", "Placebo\n(N=150)", "10 mg\n(N=151)", "30 mg\n(N=149)" },
            Enumerable.Range(1, 4).Select(c => sheet.Cell(LastHeaderRow, c).GetString()));
        Assert.All(Enumerable.Range(1, 4), c => Assert.Equal(XLBorderStyleValues.Thin, sheet.Cell(FirstHeaderRow, c).Style.Border.TopBorder));
        Assert.All(Enumerable.Range(1, 4), c => Assert.Equal(XLBorderStyleValues.Thin, sheet.Cell(LastHeaderRow, c).Style.Border.BottomBorder));
    }

    [Fact]
    public void Body_texts_appear_in_order_and_the_last_row_carries_the_closing_rule()
    {
        var document = ResponderTableFixture.Responders();
        using var excel = new ExcelWorkbookReader(document);
        var sheet = excel.Sheet;

        for (int r = 0; r < document.Rows.Count; r++)
        {
            var row = document.Rows[r];
            Assert.Equal(row.Label, sheet.Cell(FirstBodyRow + r, 1).GetString());
            Assert.Equal(row.Indent, sheet.Cell(FirstBodyRow + r, 1).Style.Alignment.Indent);
            for (int c = 0; c < row.Cells.Count; c++)
            {
                var cell = sheet.Cell(FirstBodyRow + r, c + 2);
                if (row.Cells[c].Number is double number)
                    Assert.Equal(number, cell.GetDouble());
                else
                    Assert.Equal(row.Cells[c].Text, cell.GetString());
            }
        }
        int last = FirstBodyRow + document.Rows.Count - 1;
        Assert.All(Enumerable.Range(1, 4), c => Assert.Equal(XLBorderStyleValues.Thin, sheet.Cell(last, c).Style.Border.BottomBorder));
        Assert.Equal(XLBorderStyleValues.None, sheet.Cell(last - 1, 2).Style.Border.BottomBorder);

        Assert.True(sheet.Row(last + 1).IsEmpty());
        for (int f = 0; f < document.Footnotes.Count; f++)
        {
            Assert.Equal(document.Footnotes[f], sheet.Cell(last + 2 + f, 1).GetString());
            Assert.True(sheet.Cell(last + 2 + f, 1).IsMerged());
        }
        Assert.Equal(document.SourceLine, sheet.Cell(last + 2 + document.Footnotes.Count, 1).GetString());
    }

    [Fact]
    public void Single_numbers_are_numeric_cells_with_the_layout_format()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders());
        var sheet = excel.Sheet;
        var homogeneity = sheet.Column(1).CellsUsed().Single(c => c.GetString().StartsWith("p-value for homogeneity", StringComparison.Ordinal)).Address.RowNumber;
        var median = sheet.Column(1).CellsUsed().Single(c => c.GetString() == "Median").Address.RowNumber;

        var p = sheet.Cell(homogeneity, 3);
        Assert.Equal(XLDataType.Number, p.DataType);
        Assert.Equal(0.41207, p.GetDouble());
        Assert.Equal("0.000", p.Style.NumberFormat.Format);

        var negative = sheet.Cell(median, 2);
        Assert.Equal(XLDataType.Number, negative.DataType);
        Assert.Equal(-1.0, negative.GetDouble());
        Assert.Equal("0.0", negative.Style.NumberFormat.Format);

        var pText = sheet.Cell(homogeneity - 1, 3);
        Assert.Equal(XLDataType.Text, pText.DataType);
        Assert.Equal("<0.001", pText.GetString());
    }

    [Fact]
    public void Texts_that_look_like_formulas_or_numbers_stay_text()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.WithFormulaLikeTexts());
        var sheet = excel.Sheet;
        string[] expected = ["=1+1", "=1+1", "+2", "@SUM(A1)", "-1.5", "-1.5", "0.003", "1E5"];
        var cells = new[] { sheet.Cell(FirstBodyRow, 1), sheet.Cell(FirstBodyRow, 2), sheet.Cell(FirstBodyRow, 3), sheet.Cell(FirstBodyRow, 4),
            sheet.Cell(FirstBodyRow + 1, 1), sheet.Cell(FirstBodyRow + 1, 2), sheet.Cell(FirstBodyRow + 1, 3), sheet.Cell(FirstBodyRow + 1, 4) };

        for (int i = 0; i < cells.Length; i++)
        {
            Assert.False(cells[i].HasFormula, $"{cells[i].Address} became a formula");
            Assert.Equal(XLDataType.Text, cells[i].DataType);
            Assert.Equal(expected[i], cells[i].GetString());
        }
        // In the file itself no cell carries a formula element.
        using var zip = new ZipArchive(new MemoryStream(excel.Bytes));
        using var reader = new StreamReader(zip.GetEntry("xl/worksheets/sheet1.xml")!.Open());
        Assert.DoesNotContain("<x:f>", reader.ReadToEnd());
    }

    [Fact]
    public void Panes_are_frozen_below_the_header_rows()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders());
        var view = excel.Sheet.SheetView;

        Assert.Equal(LastHeaderRow, view.SplitRow);
        Assert.Equal(0, view.SplitColumn);
    }

    [Fact]
    public void Print_setup_is_landscape_fit_to_width_with_titles_and_headers_repeated_and_no_gridlines()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.LongTable());
        var page = excel.Sheet.PageSetup;

        Assert.Equal(XLPageOrientation.Landscape, page.PageOrientation);
        Assert.Equal(XLPaperSize.LetterPaper, page.PaperSize);
        Assert.Equal(1, page.PagesWide);
        Assert.Equal(0, page.PagesTall);
        Assert.Equal(1, page.FirstRowToRepeatAtTop);
        Assert.Equal(LastHeaderRow - 1, page.LastRowToRepeatAtTop);
        Assert.False(page.ShowGridlines);
    }

    [Fact]
    public void Repeated_rows_are_written_as_absolute_rows_so_every_spreadsheet_application_repeats_them()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders());
        using var zip = new ZipArchive(new MemoryStream(excel.Bytes));
        using var reader = new StreamReader(zip.GetEntry("xl/workbook.xml")!.Open());

        Assert.Contains(">'14.2.1'!$1:$7<", reader.ReadToEnd());
    }

    [Fact]
    public void Printed_page_header_has_the_study_line_and_page_x_of_y_in_the_table_font()
    {
        var document = ResponderTableFixture.Responders() with { StudyLine = "Study QF217-301 R&D" };
        using var excel = new ExcelWorkbookReader(document);
        using var zip = new ZipArchive(new MemoryStream(excel.Bytes));
        using var reader = new StreamReader(zip.GetEntry("xl/worksheets/sheet1.xml")!.Open());
        var header = System.Xml.Linq.XDocument.Parse(reader.ReadToEnd()).Descendants().Single(e => e.Name.LocalName == "oddHeader").Value;

        // SpreadsheetML header codes (ECMA-376 Part 1, 18.3.1.39): &L left, &R right, &P page, &N pages, && an ampersand.
        Assert.Equal("&L&9&\"Courier New,Regular\"Study QF217-301 R&&D&R&9&\"Courier New,Regular\"Page &P of &N", header);
    }

    [Fact]
    public void A4_portrait_comes_from_the_page_settings()
    {
        var page = new PageSettings(PaperSize.A4, PageOrientation.Portrait);
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders(page));

        Assert.Equal(XLPageOrientation.Portrait, excel.Sheet.PageSetup.PageOrientation);
        Assert.Equal(XLPaperSize.A4Paper, excel.Sheet.PageSetup.PaperSize);
    }

    [Fact]
    public void Column_widths_follow_the_longest_text_and_are_capped()
    {
        var document = ResponderTableFixture.Responders();
        using var excel = new ExcelWorkbookReader(document);
        var sheet = excel.Sheet;

        // Longest label: the 55-character section row at indent 0.
        Assert.Equal(57, sheet.Column(1).Width, 3);
        // Longest value: "(11.5, 32.5)" and "-4.4 (3.62)", 12 characters.
        Assert.Equal(14, sheet.Column(3).Width, 3);

        var wide = document with { Rows = [new BodyRow(new string('x', 200), 0, [new LayoutCell(new string('9', 90)), LayoutCell.Empty, LayoutCell.Empty])] };
        using var capped = new ExcelWorkbookReader(wide);
        Assert.Equal(ExcelColumnWidths.MaxLabelWidth, capped.Sheet.Column(1).Width, 3);
        Assert.Equal(ExcelColumnWidths.MaxValueWidth, capped.Sheet.Column(2).Width, 3);
    }

    [Fact]
    public void A_number_whose_display_would_differ_from_the_table_text_is_refused()
    {
        var document = ResponderTableFixture.Responders() with
        {
            Rows = [new BodyRow("p-value", 1, [new LayoutCell("0.412", 0.4126, "0.000"), LayoutCell.Empty, LayoutCell.Empty])],
        };

        var error = Assert.Throws<TableRenderException>(() => new ExcelTableRenderer().Write(document, new MemoryStream()));
        Assert.Equal("Table 14.2.1, row \"p-value\", column 2: the number 0.4126 in format \"0.000\" would show \"0.413\" but the table shows \"0.412\".", error.Message);
    }

    [Fact]
    public void A_workbook_holds_one_sheet_per_table_in_order_with_unique_names()
    {
        var first = ResponderTableFixture.Responders();
        var second = ResponderTableFixture.LongTable();
        using var excel = new ExcelWorkbookReader(first, second, first);

        Assert.Equal(new[] { "14.2.1", "14.3.1.1", "14.2.1 (2)" }, excel.Workbook.Worksheets.Select(w => w.Name));
        Assert.Equal("Table 14.3.1.1", excel.Workbook.Worksheet(2).Cell(1, 1).GetString());
        // One title line in the long table: its header rows end on row 6.
        Assert.Equal(6, excel.Workbook.Worksheet(2).SheetView.SplitRow);
    }

    [Fact]
    public void Open_xml_validator_reports_no_errors_in_the_workbook()
    {
        using var excel = new ExcelWorkbookReader(ResponderTableFixture.Responders(), ResponderTableFixture.LongTable());
        using var package = SpreadsheetDocument.Open(new MemoryStream(excel.Bytes), false);

        var errors = new OpenXmlValidator(FileFormatVersions.Office2010)
            .Validate(package).Select(e => $"{e.Description} at {e.Part?.Uri} {e.Path?.XPath}").ToList();
        Assert.True(errors.Count == 0, string.Join("\n", errors));
    }

    [Fact]
    public void An_empty_workbook_is_a_clear_error()
    {
        var error = Assert.Throws<TableRenderException>(() => new ExcelWorkbookRenderer().Write([], new MemoryStream()));
        Assert.Equal("A workbook needs at least one table.", error.Message);
    }
}
