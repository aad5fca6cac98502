using ClosedXML.Excel;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>--combined: all tables in one .docx (contents, one section per table) and one .xlsx (a sheet per table and the results sheet).</summary>
public sealed class CombinedOutputTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public CombinedOutputTests()
    {
        var error = new StringWriter();
        Assert.True(OutputForge.Cli.Program.Run(["demo", "--out", _folder.Path, "--timestamp", "2026-12-01T09:00:00Z", "--quiet", "--combined"], error) == 0, error.ToString());
    }

    private string Output(string name) => Path.Combine(_folder.Path, "output", name);

    public void Dispose() => _folder.Dispose();

    /// <summary>The demo's table ids from its output files, in table-number order (14.2.1.9 before 14.2.1.10).</summary>
    private List<string> TableIds() => Directory.GetFiles(Path.Combine(_folder.Path, "output"), "table-*.docx")
        .Select(f => Path.GetFileNameWithoutExtension(f)["table-".Length..])
        .Order(OutputForge.Layout.TableIdOrder.Instance)
        .ToList();

    [Fact]
    public void The_document_has_a_contents_page_then_each_table_in_its_own_section_in_table_number_order()
    {
        using var document = WordprocessingDocument.Open(Output("all-tables.docx"), false);
        var body = document.MainDocumentPart!.Document.Body!;
        var paragraphs = body.Elements<Paragraph>().Select(p => p.InnerText).ToList();
        Assert.Equal("Contents", paragraphs[0]);

        var ids = TableIds();
        var entries = body.Elements<Paragraph>().Where(p => p.Descendants<Hyperlink>().Any()).ToList();
        Assert.Equal(ids.Select(id => $"Table {id}  "), entries.Select((e, i) => e.InnerText[..(ids[i].Length + 8)]));
        // Every entry links to its table's heading and shows its page through PAGEREF.
        var bookmarks = body.Descendants<BookmarkStart>().Select(b => b.Name!.Value).ToList();
        Assert.Equal(entries.Select(e => e.Descendants<Hyperlink>().Single().Anchor!.Value), bookmarks);
        Assert.All(entries, e => Assert.Contains("PAGEREF", e.Descendants<FieldCode>().Single().Text));

        // One section for the contents and one per table, each table's starting on a new page.
        var sections = body.Descendants<SectionProperties>().ToList();
        Assert.Equal(1 + ids.Count, sections.Count);
        Assert.All(sections.Skip(1), s => Assert.NotNull(s.GetFirstChild<TitlePage>()));
        Assert.Equal(ids.Count, body.Elements<Table>().Count());
        Assert.Equal(ids, body.Elements<Paragraph>().Where(p => p.Descendants<BookmarkStart>().Any()).Select(p => p.InnerText[6..]));
    }

    [Fact]
    public void The_workbook_has_a_sheet_per_table_and_a_filterable_results_sheet_with_every_record()
    {
        using var workbook = new XLWorkbook(Output("all-tables.xlsx"));
        Assert.Equal([.. TableIds(), "results"], workbook.Worksheets.Select(w => w.Name));

        var results = workbook.Worksheet("results");
        Assert.Equal(["table", "row", "column", "statistic", "value", "formatted", "rowLabel", "columnLabel", "method", "note"],
            results.Row(1).CellsUsed().Select(c => c.GetString()));
        Assert.True(results.AutoFilter.IsEnabled);
        Assert.Equal(1, results.SheetView.SplitRow);

        using var json = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Output("results.json")));
        var records = json.RootElement.GetProperty("records").EnumerateArray().ToList();
        Assert.Equal(records.Count, results.LastRowUsed().RowNumber() - 1);
        // Row by row as results.json, with the tables in table-number order.
        var order = TableIds();
        records = [.. records.OrderBy(r => order.IndexOf(r.GetProperty("table").GetString()!))];
        for (int i = 0; i < records.Count; i++)
        {
            var row = results.Row(i + 2);
            Assert.Equal(records[i].GetProperty("table").GetString(), row.Cell(1).GetString());
            Assert.Equal(records[i].GetProperty("statistic").GetString(), row.Cell(4).GetString());
            Assert.Equal(records[i].GetProperty("formatted").GetString(), row.Cell(6).GetString());
            // The workbook holds 15 significant digits (Excel's precision, and what ClosedXML writes);
            // results.json keeps the full double.
            if (records[i].GetProperty("value").ValueKind == System.Text.Json.JsonValueKind.Number)
            {
                var expected = records[i].GetProperty("value").GetDouble();
                Assert.True(Math.Abs(expected - row.Cell(5).GetDouble()) <= 1e-14 * Math.Max(1, Math.Abs(expected)), $"record {i}: {expected} vs {row.Cell(5).GetDouble()}");
            }
        }
    }
}
