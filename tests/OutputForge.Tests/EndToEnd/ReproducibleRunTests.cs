using System.Security.Cryptography;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Validation;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>Same specs, data and timestamp give byte-identical outputs, and the packages stay valid Office Open XML.</summary>
public sealed class ReproducibleRunTests
{
    private static Dictionary<string, string> RunDemo(string folder, string timestamp)
    {
        var error = new StringWriter();
        Assert.True(OutputForge.Cli.Program.Run(["demo", "--out", folder, "--timestamp", timestamp, "--quiet", "--combined"], error) == 0, error.ToString());
        // manifest.json records the command line, which names each run's own output folder.
        return Directory.GetFiles(Path.Combine(folder, "output"))
            .Where(f => Path.GetFileName(f) != "manifest.json")
            .ToDictionary(f => Path.GetFileName(f), f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))));
    }

    [Fact]
    public void Two_runs_with_the_same_timestamp_are_byte_identical_and_valid()
    {
        using var first = new TempFolder();
        using var second = new TempFolder();
        var a = RunDemo(first.Path, "2026-12-01T09:00:00Z");
        var b = RunDemo(second.Path, "2026-12-01T09:00:00Z");
        Assert.Equal(a.Keys.Order(), b.Keys.Order());
        Assert.Contains("all-tables.docx", a.Keys);
        Assert.Contains("all-tables.xlsx", a.Keys);
        foreach (var file in a.Keys)
        {
            Assert.True(a[file] == b[file], $"{file} differs between two identical runs");
        }

        // Word 2016 and later (and LibreOffice) read the 2010+ table-look attributes the renderer writes.
        var validator = new OpenXmlValidator(DocumentFormat.OpenXml.FileFormatVersions.Office2016);
        foreach (var file in Directory.GetFiles(Path.Combine(first.Path, "output"), "*.docx"))
        {
            using var document = WordprocessingDocument.Open(file, false);
            Assert.Empty(validator.Validate(document).Select(e => $"{Path.GetFileName(file)}: {e.Description}"));
        }
        foreach (var file in Directory.GetFiles(Path.Combine(first.Path, "output"), "*.xlsx"))
        {
            using var workbook = SpreadsheetDocument.Open(file, false);
            Assert.Empty(validator.Validate(workbook).Select(e => $"{Path.GetFileName(file)}: {e.Description}"));
        }
    }

    [Fact]
    public void A_different_timestamp_changes_the_documents()
    {
        using var first = new TempFolder();
        using var second = new TempFolder();
        var a = RunDemo(first.Path, "2026-12-01T09:00:00Z");
        var b = RunDemo(second.Path, "2026-12-02T09:00:00Z");
        Assert.NotEqual(a["table-14.2.1.1.docx"], b["table-14.2.1.1.docx"]);
    }
}
