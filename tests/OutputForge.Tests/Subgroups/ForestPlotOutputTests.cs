using System.Text.Json;
using DocumentFormat.OpenXml.Packaging;
using OutputForge.Tests.Support;
using DW = DocumentFormat.OpenXml.Drawing.Wordprocessing;
using W = DocumentFormat.OpenXml.Wordprocessing;

namespace OutputForge.Tests.Subgroups;

/// <summary>
/// The demo's forest plot as a user receives it: a PNG beside the table's files, listed in
/// manifest.json, and the same picture after the table in its .docx and in the combined .docx,
/// described by its alt text.
/// </summary>
public sealed class ForestPlotOutputTests(ForestPlotOutputTests.CombinedDemo demo) : IClassFixture<ForestPlotOutputTests.CombinedDemo>
{
    private const string Png = "table-14.2.5.1-forest.png";

    /// <summary>The demo run once with --combined at a fixed time.</summary>
    public sealed class CombinedDemo : IDisposable
    {
        public CombinedDemo()
        {
            var error = new StringWriter();
            Code = OutputForge.Cli.Program.Run(["demo", "--out", Folder.Path, "--timestamp", "2026-12-01T09:00:00Z", "--quiet", "--combined"], error);
            Error = error.ToString();
        }

        public TempFolder Folder { get; } = new();
        public int Code { get; }
        public string Error { get; }

        public void Dispose() => Folder.Dispose();
    }

    private TempFolder Folder => demo.Folder;

    private string Output(string name)
    {
        Assert.True(demo.Code == 0, demo.Error);
        return Path.Combine(Folder.Path, "output", name);
    }

    [Fact]
    public void Only_the_subgroup_table_writes_a_picture_and_the_manifest_lists_it()
    {
        Assert.Equal([Png], Directory.GetFiles(Path.Combine(Folder.Path, "output"), "*.png").Select(Path.GetFileName));
        using var manifest = JsonDocument.Parse(File.ReadAllText(Output("manifest.json")));
        var table = manifest.RootElement.GetProperty("tables").EnumerateArray().Single(t => t.GetProperty("id").GetString() == "14.2.5.1");
        Assert.Contains(Png, table.GetProperty("outputs").EnumerateArray().Select(o => o.GetString()));
        var listed = manifest.RootElement.GetProperty("outputs").EnumerateArray().Single(o => o.GetProperty("name").GetString() == Png);
        Assert.Equal(Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(Output(Png)))),
            listed.GetProperty("sha256").GetString(), ignoreCase: true);
    }

    [Theory]
    [InlineData("table-14.2.5.1.docx")]
    [InlineData("all-tables.docx")]
    public void The_document_shows_the_same_picture_after_the_table_with_its_alt_text(string file)
    {
        using var document = WordprocessingDocument.Open(Output(file), false);
        var main = document.MainDocumentPart!;
        var body = main.Document.Body!;
        var drawing = Assert.Single(body.Descendants<W.Drawing>());
        var description = drawing.Descendants<DW.DocProperties>().Single().Description!.Value!;
        Assert.StartsWith("Forest plot for Table 14.2.5.1: difference in percentage points with 95% confidence intervals of QF-217 10 mg and QF-217 30 mg against Placebo", description);
        var blip = drawing.Descendants<DocumentFormat.OpenXml.Drawing.Blip>().Single();
        var image = (ImagePart)main.GetPartById(blip.Embed!.Value!);
        using var stream = image.GetStream();
        using var bytes = new MemoryStream();
        stream.CopyTo(bytes);
        Assert.Equal(File.ReadAllBytes(Output(Png)), bytes.ToArray());
        // After the subgroup table: the picture's paragraph follows that table's last footnote, on a new page.
        var elements = body.Elements().ToList();
        var picture = elements.FindIndex(e => e.Descendants<W.Drawing>().Any());
        var table = elements.FindLastIndex(picture, e => e is W.Table);
        Assert.Equal("Table 14.2.5.1", elements.Take(table).Last(e => e.InnerText.StartsWith("Table 14.", StringComparison.Ordinal)).InnerText);
        Assert.All(elements.Skip(table + 1).Take(picture - table - 1), e => Assert.IsType<W.Paragraph>(e));
        Assert.Contains(elements.Skip(table + 1).Take(picture - table - 1), e => e.InnerText.StartsWith("[b] Treatment-by-subgroup interaction", StringComparison.Ordinal));
        Assert.NotNull(elements[picture].Descendants<W.PageBreakBefore>().SingleOrDefault());
    }
}
