using System.Security.Cryptography;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>
/// --combined with --tables: the combined files hold every table of the folder, the kept ones as the folder keeps them
/// (rebuilt and checked byte for byte against their files); when a kept table would come out otherwise, the run stops.
/// </summary>
public sealed class CombinedWithSelectedTablesTests
{
    private static string Digest(string file) => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(file)));

    private static (int Code, string Error) Run(params string[] args)
    {
        var error = new StringWriter();
        return (OutputForge.Cli.Program.Run(args, error), error.ToString());
    }

    [Fact]
    public void The_combined_files_cover_the_kept_tables_or_the_run_stops_naming_the_one_that_changed()
    {
        using var folder = new TempFolder();
        var output = folder.File("output");
        Assert.Equal(0, Run("demo", "--out", folder.Path, "--timestamp", "2026-12-01T09:00:00Z", "--quiet", "--combined").Code);
        var full = Digest(Path.Combine(output, "all-tables.docx"));
        var tables = Directory.GetFiles(output, "table-*.docx").Length;
        string[] rerun = ["run", "--spec", folder.File("specs/demo"), "--data", folder.File("data"), "--out", output, "--quiet", "--combined", "--tables", "14.2.1.1"];

        // The same time: the selected table comes out as before, so the combined document is the full run's, byte for byte.
        var same = Run([.. rerun, "--timestamp", "2026-12-01T09:00:00Z"]);
        Assert.True(same.Code == 0, same.Error);
        Assert.Equal(full, Digest(Path.Combine(output, "all-tables.docx")));

        // A later time: the combined document still lists every table of the folder.
        var later = Run([.. rerun, "--timestamp", "2026-12-02T09:00:00Z"]);
        Assert.True(later.Code == 0, later.Error);
        using (var document = WordprocessingDocument.Open(Path.Combine(output, "all-tables.docx"), false))
        {
            var entries = document.MainDocumentPart!.Document.Body!.Elements<Paragraph>().Count(p => p.Descendants<Hyperlink>().Any());
            Assert.Equal(tables, entries);
        }
        using (var workbook = new ClosedXML.Excel.XLWorkbook(Path.Combine(output, "all-tables.xlsx")))
        {
            Assert.Equal(tables + 1, workbook.Worksheets.Count);
        }

        // Adverse events changed since the kept adverse-event tables were made: they cannot be in the combined files as kept.
        var adae = folder.File("data/adae.csv");
        File.WriteAllLines(adae, File.ReadAllLines(adae).Where((_, i) => i != 1));
        var before = Directory.GetFiles(output).ToDictionary(f => f, Digest);
        var changed = Run([.. rerun, "--timestamp", "2026-12-03T09:00:00Z"]);
        Assert.Equal(3, changed.Code);
        var line = Assert.Single(changed.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Matches(@"--combined with --tables: the combined files must hold every table of the folder, but table 14\.3\.[0-9.]+ comes out otherwise than its kept table-14\.3\.", line);
        Assert.EndsWith("run every table (without --tables) to make the combined files", line.TrimEnd());
        Assert.Equal(before, Directory.GetFiles(output).ToDictionary(f => f, Digest));
    }
}
