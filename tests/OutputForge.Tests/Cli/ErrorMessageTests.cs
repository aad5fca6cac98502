using OutputForge.Cli;
using OutputForge.Tests.Support;
using OutputForge.Tests.Workflow;

namespace OutputForge.Tests.Cli;

/// <summary>Error messages say once where the problem is and what would be right.</summary>
public sealed class ErrorMessageTests
{
    private static (int Code, string Error) Run(params string[] args)
    {
        var error = new StringWriter();
        var code = Program.Run(args, error);
        return (code, error.ToString());
    }

    [Fact]
    public void A_json_syntax_error_gives_its_location_once()
    {
        // Line 9 of the table spec becomes "visit": , (a ',' where a value should start).
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"visit\": \"Week 4\",", "\"visit\": ,"));

        var (code, error) = Run("run", "--spec", study.Folder, "--out", study.OutputFolder);

        Assert.Equal(ExitCodes.InputError, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Matches(@"t1\.json:9:\d+: .*invalid JSON: ", line);
        Assert.DoesNotContain("LineNumber", line);
        Assert.DoesNotContain("BytePositionInLine", line);
    }

    [Fact]
    public void A_mis_cased_population_key_says_what_a_key_must_look_like()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"itt\": {", "\"ITT\": {"),
            table: MiniStudy.TableJson.Replace("\"population\": \"itt\"", "\"population\": \"ITT\""));

        var (code, error) = Run("run", "--spec", study.Folder, "--out", study.OutputFolder);

        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("key 'ITT' must start with a lower-case letter and hold only lower-case letters, digits and '_' (did you mean 'itt'?)", error);
        Assert.DoesNotContain("regular expression", error);
    }

    [Fact]
    public void Check_names_spec_errors_as_spec_errors()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"population\": \"itt\"", "\"population\": \"safety\""));

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.Folder]);

        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("unknown population 'safety'", output);
        Assert.Contains("were not made because of the spec errors above", output);
        Assert.DoesNotContain("data errors", output);
    }

    [Fact]
    public void Check_names_data_errors_as_data_errors()
    {
        using var study = new MiniStudy(adsl: MiniStudy.Adsl + "T1,T1-001,Placebo,0,Y,40\n");

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.Folder]);

        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("were not made because of the data errors above", output);
    }
}
