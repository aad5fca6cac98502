using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>
/// --tables given with nothing in it selects no table: a usage error before anything is read or written (it used to run
/// no table and still rewrite results.json and manifest.json).
/// </summary>
public sealed class TableSelectionOptionTests
{
    [Theory]
    [InlineData("run", "")]
    [InlineData("run", ",")]
    [InlineData("run", " , ")]
    [InlineData("shells", "")]
    public void An_empty_selection_is_refused_and_writes_nothing(string command, string selection)
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"control\": \"Placebo\"",
            "\"control\": \"Placebo\", \"arms\": [{ \"value\": \"Placebo\" }, { \"value\": \"Active\", \"order\": 1 }]"));
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run([command, "--spec", study.Folder, "--out", study.OutputFolder, "--tables", selection], error);
        Assert.Equal(1, code);
        Assert.Contains("outputforge: error: --tables: the selection is empty", error.ToString());
        Assert.False(Directory.Exists(study.OutputFolder));
    }

    [Fact]
    public void A_selection_still_runs_its_tables()
    {
        using var study = new MiniStudy();
        var error = new StringWriter();
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--tables", "1", "--quiet"], error));
        Assert.True(File.Exists(Path.Combine(study.OutputFolder, "table-1.docx")), error.ToString());
    }
}
