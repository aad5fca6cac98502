using OutputForge.Cli;
using OutputForge.Tests.Support;
using OutputForge.Tests.Workflow;

namespace OutputForge.Tests.Cli;

/// <summary>Each exit code of the README's table, from a real command where one can produce it.</summary>
public sealed class ExitCodeTests
{
    [Fact]
    public void Zero_for_success()
    {
        using var study = new MiniStudy();
        Assert.Equal(ExitCodes.Success, WorkflowDemoFixture.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"]).ExitCode);
        Assert.Equal(0, ExitCodes.Success);
    }

    [Theory]
    [InlineData("calc", "proportion", "--events", "1", "--n", "3", "--method", "foo")]
    [InlineData("calc", "table", "--counts", "1,2;3,4", "--test", "t-test")]
    [InlineData("run", "--out", "x")]
    [InlineData("run", "--spec", "s", "--out", "x", "--no-such-option")]
    public void One_for_a_usage_error(params string[] args)
    {
        var (code, _, error) = WorkflowDemoFixture.Run(args);
        Assert.Equal(1, code);
        Assert.Equal(ExitCodes.Usage, code);
        Assert.NotEqual(string.Empty, error.Trim());
    }

    [Fact]
    public void One_for_a_bad_option_value_of_a_run()
    {
        using var study = new MiniStudy();
        foreach (var bad in new[] { new[] { "--format", "pdf" }, ["--timestamp", "yesterday"], ["--tables", "9.*"], ["--control-characters", "drop"] })
        {
            var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, .. bad]);
            Assert.True(code == 1, string.Join(" ", bad) + ": " + error);
        }
        Assert.False(Directory.Exists(study.OutputFolder));
    }

    [Fact]
    public void Two_for_a_spec_or_data_problem()
    {
        using var study = new MiniStudy(adeff: MiniStudy.Adeff + "T1,T1-001,RESP\n");
        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder]);
        Assert.Equal(2, code);
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("adeff.csv", error);
    }

    [Fact]
    public void Three_when_the_outputs_cannot_be_written()
    {
        using var study = new MiniStudy();
        var blocker = Path.Combine(study.Folder, "blocker");
        File.WriteAllText(blocker, "a file where the output folder's parent should be");
        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", study.Folder, "--out", Path.Combine(blocker, "out"), "--quiet"]);
        Assert.True(code == 3, error);
        Assert.Equal(ExitCodes.OutputError, code);
        Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
    }

    [Fact]
    public void Seventy_for_an_internal_fault()
    {
        var error = new StringWriter();
        var code = FailureReport.Guard(error, () => throw new InvalidOperationException("a fault"));
        Assert.Equal(70, code);
        Assert.Equal(ExitCodes.InternalError, code);
        Assert.StartsWith("outputforge: internal error: InvalidOperationException: a fault", error.ToString());
    }
}
