using OutputForge.Tests.Support;
using OutputForge.Pipeline.Manifest;

namespace OutputForge.Tests.Workflow;

/// <summary>manifest.json of the demo run, short hashes in source lines, and `run --tables`.</summary>
public sealed class ManifestTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    [Fact]
    public void Sha256OfAbcIsTheFipsExample()
    {
        using var folder = new TempFolder();
        var file = folder.Write("abc.txt", "abc");
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", FileDigest.Sha256(file));
    }

    [Fact]
    public void TheManifestListsEveryInputAndOutputWithItsDigest()
    {
        var manifest = ManifestJson.Read(demo.Before);

        Assert.Equal("QF217-301", manifest.Study);
        Assert.Equal("demo", manifest.CommandLine[1]);
        var study = DemoStudyTables.Read();
        Assert.Equal(study.DataFiles.Order(StringComparer.Ordinal), manifest.Data.Select(d => d.Name).ToArray());
        foreach (var data in manifest.Data)
        {
            var path = Path.Combine(demo.Data, data.Name);
            Assert.Equal(FileDigest.Sha256(path), data.Sha256);
            Assert.Equal(SimpleCsv.Read(path).Count, data.Rows);
        }
        Assert.Equal(1 + study.TableFiles.Count, manifest.Specs.Count);
        var files = Directory.GetFiles(demo.Before).Select(Path.GetFileName).Where(f => f != ManifestJson.FileName).Order().ToArray();
        Assert.Equal(files, manifest.Outputs.Select(o => o.Name).Order().ToArray());
        Assert.All(manifest.Outputs, o => Assert.Equal(FileDigest.Sha256(Path.Combine(demo.Before, o.Name)), o.Sha256));
        var table = manifest.Tables.Single(t => t.Id == "14.2.1.1");
        Assert.Equal(["tables/14.2.1.1-itch-responders-week12-itt.json", "adsl.csv", "adeff.csv"], table.Inputs.Select(i => i.Name).ToArray());
        Assert.Equal(["table-14.2.1.1.docx", "table-14.2.1.1.xlsx"], table.Outputs.ToArray());
    }

    [Fact]
    public void TheSourceLineShowsTheDataFilesShortHashes()
    {
        var manifest = ManifestJson.Read(demo.Before);
        var adsl = manifest.Data.Single(d => d.Name == "adsl.csv").Sha256[..8];
        var adeff = manifest.Data.Single(d => d.Name == "adeff.csv").Sha256[..8];

        var paragraphs = DocumentReader.WordFooterParagraphs(Path.Combine(demo.Before, "table-14.2.1.1.docx"));

        Assert.Contains(paragraphs, p => p.Contains($"data: adsl.csv (SHA-256 {adsl}), adeff.csv (SHA-256 {adeff});", StringComparison.Ordinal));
    }

    [Fact]
    public void RunningSomeTablesKeepsTheOthersInResultsAndManifest()
    {
        using var folder = new TempFolder();
        var output = folder.File("run");
        var spec = Path.Combine(demo.Root, "specs", "demo");
        Assert.Equal(0, WorkflowDemoFixture.Run(["run", "--spec", spec, "--data", demo.Data, "--out", output, "--format", "xlsx"]).ExitCode);
        var first = ManifestJson.Read(output);

        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", spec, "--data", demo.Data, "--out", output, "--format", "xlsx,txt", "--tables", "14.2.1.3"]);

        Assert.True(code == 0, error);
        var second = ManifestJson.Read(output);
        Assert.Equal(first.Tables.Select(t => t.Id), second.Tables.Select(t => t.Id));
        Assert.Equal(["table-14.2.1.3.xlsx", "table-14.2.1.3.txt"], second.Tables.Single(t => t.Id == "14.2.1.3").Outputs.ToArray());
        var kept = second.Tables.Single(t => t.Id == "14.2.1.1");
        Assert.Equal(["table-14.2.1.1.xlsx"], kept.Outputs.ToArray());
        Assert.Equal(first.Tables.Single(t => t.Id == "14.2.1.1").Inputs.Select(i => i.Sha256), kept.Inputs.Select(i => i.Sha256));
        Assert.Contains(second.Outputs, o => o.Name == "table-14.2.1.3.txt");
        Assert.Contains(second.Outputs, o => o.Name == "table-14.2.1.1.xlsx");
        var results = OutputForge.Workflow.RunResults.Read(output);
        Assert.Equal(DemoStudyTables.Read().TableIds, results.Tables.ToArray());
        var changes = OutputForge.Workflow.Changes.RunComparison.Compare(demo.Before, output);
        Assert.Empty(changes.ChangedTables);
        Assert.Contains(results.Records, r => r.Table == "14.2.1.3");
    }

    [Fact]
    public void ATablePatternThatMatchesNothingIsAUsageErrorFoundBeforeTheDataIsRead()
    {
        using var folder = new TempFolder();
        // The data folder does not exist: the selection must be refused before any dataset is looked for.
        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", Path.Combine(demo.Root, "specs", "demo"), "--data", folder.File("no-data"),
            "--out", folder.File("run"), "--tables", "14.9.*"]);

        Assert.Equal(1, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("outputforge: error: --tables: no table id matches '14.9.*' (ids: 14.1.1,", line);
        Assert.DoesNotContain("study.json", line);
        Assert.False(Directory.Exists(folder.File("run")));
    }
}
