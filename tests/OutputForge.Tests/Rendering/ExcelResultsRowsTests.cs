using ClosedXML.Excel;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Validation;
using OutputForge.Rendering.Excel;
using OutputForge.Results;

namespace OutputForge.Tests.Rendering;

/// <summary>
/// The results sheet's rows are streamed into the saved workbook (ExcelResultsRows) instead of being made cell by cell
/// in ClosedXML: read back, they must be what the records say, with markup, spaces, non-finite and missing values, and
/// the package must stay valid Open XML.
/// </summary>
public sealed class ExcelResultsRowsTests
{
    private static ResultRecord Record(string row, double? value, string formatted, string? method = null, string? note = null) =>
        new("14.2.1", row, "drug", "n", value, formatted, $"Label of {row}", "Drug", method, note);

    private static readonly IReadOnlyList<ResultRecord> Records =
    [
        Record("r1", 0.1 + 0.2, "0.3", "Wilson score"),
        Record("r2", 12345.678901234567, "12345.7"),
        Record("r3", null, "NE", note: "not estimable: <no events> & \"zero\" cells"),
        Record("r4", double.PositiveInfinity, ">999"),
        Record("r5", -1e-20, "<0.001", method: "  leading and trailing spaces  "),
        Record("r6", 7, "=1+1"),
    ];

    private static byte[] Workbook(IReadOnlyList<ResultRecord> records)
    {
        using var output = new MemoryStream();
        new ExcelWorkbookRenderer().Write([ResponderTableFixture.Responders()], output, records);
        return output.ToArray();
    }

    [Fact]
    public void Every_record_reads_back_cell_for_cell()
    {
        using var workbook = new XLWorkbook(new MemoryStream(Workbook(Records)));
        var sheet = workbook.Worksheet("results");

        Assert.Equal(Records.Count + 1, sheet.LastRowUsed().RowNumber());
        for (var i = 0; i < Records.Count; i++)
        {
            var record = Records[i];
            var row = sheet.Row(i + 2);
            Assert.Equal(record.Table, row.Cell(1).GetString());
            Assert.Equal(record.Row, row.Cell(2).GetString());
            Assert.Equal(record.Column, row.Cell(3).GetString());
            Assert.Equal(record.Statistic, row.Cell(4).GetString());
            Assert.Equal(record.Formatted, row.Cell(6).GetString());
            Assert.Equal(XLDataType.Text, row.Cell(6).DataType);
            Assert.Equal(record.RowLabel, row.Cell(7).GetString());
            Assert.Equal(record.ColumnLabel, row.Cell(8).GetString());
            Assert.Equal(record.Method ?? string.Empty, row.Cell(9).GetString());
            Assert.Equal(record.Note ?? string.Empty, row.Cell(10).GetString());
        }
        // Finite values are numbers with Excel's 15 significant digits and the left-aligned General style.
        var sum = sheet.Cell(2, 5);
        Assert.Equal(XLDataType.Number, sum.DataType);
        // 0.1 + 0.2 is 0.30000000000000004 as a double (IEEE 754); to 15 significant digits it is 0.3.
        Assert.Equal(0.3, sum.GetDouble());
        Assert.NotEqual(0.3, 0.1 + 0.2);
        Assert.Equal(12345.6789012346, sheet.Cell(3, 5).GetDouble());
        Assert.Equal(-1e-20, sheet.Cell(6, 5).GetDouble());
        Assert.Equal(XLAlignmentHorizontalValues.Left, sum.Style.Alignment.Horizontal);
        Assert.Equal("General", sum.Style.NumberFormat.Format);
        // A missing value makes no cell, a non-finite one is text, and formula-like text stays text.
        Assert.True(sheet.Cell(4, 5).IsEmpty());
        Assert.Equal("Infinity", sheet.Cell(5, 5).GetString());
        Assert.Equal(XLDataType.Text, sheet.Cell(5, 5).DataType);
        Assert.False(sheet.Cell(7, 6).HasFormula);
        Assert.Equal("A1:J7", sheet.AutoFilter.Range.RangeAddress.ToString());
    }

    [Fact]
    public void The_package_is_valid_open_xml()
    {
        using var document = SpreadsheetDocument.Open(new MemoryStream(Workbook(Records)), false);
        var errors = new OpenXmlValidator(FileFormatVersions.Office2016).Validate(document)
            .Select(e => $"{e.Description} at {e.Part?.Uri} {e.Path?.XPath}").ToList();
        Assert.Empty(errors);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    public void A_sheet_with_no_numbers_has_the_header_and_its_text_rows_only(int rows)
    {
        var records = Records.Where(r => r.Value is null).Take(rows).ToList();
        using var workbook = new XLWorkbook(new MemoryStream(Workbook(records)));
        var sheet = workbook.Worksheet("results");

        Assert.Equal(rows + 1, sheet.LastRowUsed().RowNumber());
        Assert.Equal("table", sheet.Cell(1, 1).GetString());
        Assert.True(sheet.Cell(1, 1).Style.Font.Bold);
        Assert.True(sheet.Cell(2, 5).IsEmpty());
    }

    [Fact]
    public void A_control_character_becomes_a_visible_marker_not_a_broken_package()
    {
        var records = new[] { Record("r1", 1, "1", note: "bell\u0007 and lone \uD800 surrogate") };
        using var workbook = new XLWorkbook(new MemoryStream(Workbook(records)));

        Assert.Equal("bell\uFFFD and lone \uFFFD surrogate", workbook.Worksheet("results").Cell(2, 10).GetString());
    }
}
