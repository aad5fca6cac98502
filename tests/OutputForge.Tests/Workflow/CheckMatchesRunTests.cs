using System.CommandLine;
using OutputForge.Cli.Commands;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// `check` applies every rule `run` applies and takes the options that change what a run accepts: a package check
/// passes is not refused by run, and one run refuses is not passed by check.
/// </summary>
public sealed class CheckMatchesRunTests
{
    /// <summary>A study whose specs are in specs/ and whose data.folder is ../data, outside the spec's folder tree.</summary>
    private static TempFolder StudyWithDataBesideTheSpecs(string adsl = MiniStudy.Adsl)
    {
        var folder = new TempFolder();
        folder.Write("specs/study.json", MiniStudy.StudyJson.Replace("\"folder\": \"data\"", "\"folder\": \"../data\""));
        folder.Write("specs/t1.json", MiniStudy.TableJson);
        folder.Write("data/adsl.csv", adsl);
        folder.Write("data/adeff.csv", MiniStudy.Adeff);
        return folder;
    }

    private static (int Run, string RunError, int Check, string CheckOutput) Both(TempFolder folder, params string[] options)
    {
        var run = WorkflowDemoFixture.Run(["run", "--spec", folder.File("specs"), "--out", folder.File("out"), "--quiet", .. options]);
        var check = WorkflowDemoFixture.Run(["check", "--spec", folder.File("specs"), .. options]);
        return (run.ExitCode, run.Error, check.ExitCode, check.Output + check.Error);
    }

    [Fact]
    public void A_data_folder_outside_the_spec_folder_is_refused_by_both_and_allowed_by_both_with_allow_folder()
    {
        using var folder = StudyWithDataBesideTheSpecs();

        var refused = Both(folder);
        Assert.Equal(2, refused.Run);
        Assert.Equal(2, refused.Check);
        Assert.Contains("'../data' is outside the spec's folder", refused.RunError);
        Assert.Contains("'../data' is outside the spec's folder", refused.CheckOutput);

        var allowed = Both(folder, "--allow-folder", folder.File("data"));
        Assert.True(allowed.Run == 0, allowed.RunError);
        Assert.True(allowed.Check == 0, allowed.CheckOutput);
        Assert.Contains("check: 0 errors", allowed.CheckOutput);
    }

    [Fact]
    public void Control_characters_are_refused_by_both_and_replaced_by_both_with_the_option()
    {
        using var folder = StudyWithDataBesideTheSpecs(MiniStudy.Adsl.Replace("T1,T1-004,Active,1,Y,66", "T1,T1-004,Act\u0007ive,1,Y,66"));

        var refused = Both(folder, "--allow-folder", folder.File("data"));
        Assert.Equal(2, refused.Run);
        Assert.Equal(2, refused.Check);

        var replaced = Both(folder, "--allow-folder", folder.File("data"), "--control-characters", "replace");
        Assert.True(replaced.Run == 0, replaced.RunError);
        Assert.True(replaced.Check == 0, replaced.CheckOutput);
        Assert.Contains("warning:", replaced.CheckOutput);
    }

    [Fact]
    public void A_table_pattern_that_matches_nothing_is_the_same_usage_error_in_both()
    {
        using var folder = StudyWithDataBesideTheSpecs();

        var both = Both(folder, "--allow-folder", folder.File("data"), "--tables", "9.*");

        Assert.Equal(1, both.Run);
        Assert.Equal(1, both.Check);
        Assert.Contains("--tables: no table id matches '9.*' (ids: 1)", both.RunError);
        Assert.Contains("--tables: no table id matches '9.*' (ids: 1)", both.CheckOutput);
    }

    [Theory]
    [InlineData("xpt")]
    [InlineData("json")]
    public void Check_reads_every_data_format_a_run_reads(string format)
    {
        using var folder = new TempFolder();
        Assert.Equal(0, WorkflowDemoFixture.Run(["demo", "--out", folder.Path, "--data-format", format, "--no-tables", "--quiet"]).ExitCode);

        var (code, output, error) = WorkflowDemoFixture.Run(["check", "--spec", folder.File("specs/demo"), "--data", folder.File("data")]);

        Assert.True(code == 0, output + error);
        Assert.Contains("check: 0 errors", output);
    }

    /// <summary>Options of run that only shape the outputs; every other option of run changes what it reads, and check must take it.</summary>
    private static readonly string[] OutputOnlyOptions = ["--out", "--format", "--quiet", "--verbose", "--timestamp", "--combined"];

    [Fact]
    public void Check_takes_every_option_of_run_that_is_not_about_the_outputs()
    {
        static IEnumerable<string> Names(Command command) => command.Options.Select(o => o.Name).Where(n => n.StartsWith("--", StringComparison.Ordinal));

        var run = Names(RunCommand.Create(TextWriter.Null)).Except(OutputOnlyOptions).Order().ToList();
        var check = Names(CheckCommand.Create(TextWriter.Null, TextWriter.Null)).Order().ToList();

        Assert.Equal(run, check);
    }
}
