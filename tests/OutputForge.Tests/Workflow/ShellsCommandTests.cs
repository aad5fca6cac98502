using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>`outputforge shells`: the tables' layout with placeholders, from the specs alone.</summary>
public sealed class ShellsCommandTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    [Fact]
    public void DemoShellsNeedNoDataAndKeepTheTablesLayout()
    {
        using var folder = new TempFolder();
        var studyFile = OutputForge.Demo.DemoSpecFiles.Write(folder.Path);
        Assert.False(Directory.Exists(folder.File("data")));
        var output = folder.File("shells");

        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", studyFile, "--out", output, "--format", "docx,xlsx,txt"]);

        Assert.True(code == 0, error);
        // Every table of the demo package, whatever its kind, in each of the three formats.
        Assert.Equal(DemoStudyTables.Read().TableIds.Count * 3, Directory.GetFiles(output).Length);
        Assert.DoesNotContain("no shell yet", error);
        var shell = DocumentReader.WordTableRows(Path.Combine(output, "shell-14.2.1.1.docx"));
        var table = DocumentReader.WordTableRows(Path.Combine(demo.Before, "table-14.2.1.1.docx"));
        Assert.Equal(table.Count, shell.Count);
        Assert.Equal(table.Select(r => r[0]), shell.Select(r => r[0]));
        // Header rows: the arm groups (study spec treatment.groups), the arm labels, then (N=xx) under each arm.
        var header = table.FindIndex(r => r.Skip(1).All(c => c.StartsWith("(N=", StringComparison.Ordinal)));
        Assert.Equal(table.Take(header), shell.Take(header));
        Assert.Equal(["", "(N=xx)", "(N=xx)", "(N=xx)"], shell[header]);
        var byLabel = shell.Where(r => r[0].Length > 0).ToDictionary(r => r[0], r => r.Skip(1).ToArray());
        Assert.Equal(["x (xx.x)", "x (xx.x)", "x (xx.x)"], byLabel["Responders, n (%)"]);
        Assert.Equal(["(x.x, x.x)", "(x.x, x.x)", "(x.x, x.x)"], byLabel["95% CI [a]"]);
        Assert.Equal(["", "x.x", "x.x"], byLabel["Difference in proportions, % [b]"]);
        Assert.Equal(["", "0.xxx", "0.xxx"], byLabel["p-value [c]"]);
        Assert.All(shell.Skip(header + 1).SelectMany(r => r.Skip(1)), text => Assert.Matches(@"^[x0., ()\u00a0]*$", text));

        var shellNotes = DocumentReader.WordParagraphs(Path.Combine(output, "shell-14.2.1.1.docx"));
        var tableNotes = DocumentReader.WordParagraphs(Path.Combine(demo.Before, "table-14.2.1.1.docx"));
        Assert.Equal(tableNotes.Where(p => !p.StartsWith("Source:", StringComparison.Ordinal) && !p.StartsWith("Warning:", StringComparison.Ordinal)),
            shellNotes.Where(p => !p.StartsWith("Source:", StringComparison.Ordinal)));
        Assert.Contains("Source: tables/14.2.1.1-itch-responders-week12-itt.json; data: none (mock shell);",
            DocumentReader.WordFooterText(Path.Combine(output, "shell-14.2.1.1.docx")));
    }

    [Fact]
    public void ShellRowsAreTheRunsRowsWhereNoRowDependsOnTheData()
    {
        using var folder = new TempFolder();
        var studyFile = OutputForge.Demo.DemoSpecFiles.Write(folder.Path);
        var output = folder.File("shells");

        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", studyFile, "--out", output, "--format", "docx"]);

        Assert.True(code == 0, error);
        // Populations, disposition with listed levels, responders, continuous by listed visits, time to event at listed times.
        foreach (var id in new[] { "14.1.1", "14.1.2", "14.2.1.1", "14.2.1.2", "14.2.1.3", "14.2.1.4", "14.2.2.1", "14.2.2.2", "14.2.3.1", "14.2.3.2" })
        {
            var shell = DocumentReader.WordTableRows(Path.Combine(output, $"shell-{id}.docx"));
            var table = DocumentReader.WordTableRows(Path.Combine(demo.Before, $"table-{id}.docx"));
            Assert.Equal(table.Select(r => r[0]), shell.Select(r => r[0]));
            Assert.Equal(table.Select(r => r.Count), shell.Select(r => r.Count));
        }
    }

    [Fact]
    public void PercentDecimalsOfTheSpecSetThePlaceholders()
    {
        var table = MiniStudy.TableJson.Replace("\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"percentDecimals\": 2, \"pValueFloor\": 0.0001 },");
        var study = MiniStudy.StudyJson.Replace("\"control\": \"Placebo\" }",
            "\"control\": \"Placebo\", \"arms\": [{ \"value\": \"Placebo\", \"order\": 0 }, { \"value\": \"Active\", \"order\": 1 }] }");
        using var mini = new MiniStudy(study: study, table: table);
        Directory.Delete(mini.DataFolder, recursive: true);

        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", mini.StudyFile, "--out", mini.OutputFolder, "--format", "docx"]);

        Assert.True(code == 0, error);
        var rows = DocumentReader.WordTableRows(Path.Combine(mini.OutputFolder, "shell-1.docx")).Where(r => r[0].Length > 0).ToDictionary(r => r[0], r => r.Skip(1).ToArray());
        Assert.Equal(["x (xx.xx)", "x (xx.xx)"], rows["Responders, n (%)"]);
        Assert.Equal(["(x.xx, x.xx)", "(x.xx, x.xx)"], rows["95% CI [a]"]);
        Assert.Equal(["", "0.xxxx"], rows["p-value [c]"]);
    }

    [Fact]
    public void ShellsWithoutArmsInTheSpecAskForThem()
    {
        using var mini = new MiniStudy();

        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", mini.StudyFile, "--out", mini.OutputFolder]);

        Assert.Equal(2, code);
        Assert.Contains("$.treatment: shells need the arms before there are data", error);
        Assert.False(Directory.Exists(mini.OutputFolder));
    }
}
