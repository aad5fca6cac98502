using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>The program as a user meets it: help, version, exit codes and one-line errors.</summary>
public sealed class CommandLineTests
{
    private static (int Code, string Error) Run(params string[] args)
    {
        var error = new StringWriter();
        var code = Program.Run(args, error);
        return (code, error.ToString());
    }

    [Theory]
    [InlineData("--help")]
    [InlineData("run", "--help")]
    [InlineData("demo", "--help")]
    public void Help_is_available_on_every_command(params string[] args)
    {
        var output = new StringWriter();
        var original = Console.Out;
        Console.SetOut(output);
        try
        {
            Assert.Equal(0, Run(args).Code);
        }
        finally
        {
            Console.SetOut(original);
        }
        Assert.Contains("--", output.ToString());
    }

    [Fact]
    public void A_missing_required_option_is_a_usage_error()
    {
        var (code, error) = Run("run", "--out", "x");
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Contains("--spec", error);
    }

    [Fact]
    public void An_unknown_format_is_refused_naming_the_valid_ones()
    {
        using var study = new MiniStudy();
        var (code, error) = Run("run", "--spec", study.Folder, "--out", study.OutputFolder, "--format", "pdf");
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Contains("unknown format 'pdf' (valid: docx, xlsx, txt)", error);
        Assert.False(Directory.Exists(study.OutputFolder));
    }

    [Fact]
    public void A_wrong_variable_name_gives_one_located_line_and_exit_code_2()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("ANL01FL = 'Y'", "ANL1FL = 'Y'"));
        var (code, error) = Run("run", "--spec", study.StudyFile, "--out", study.OutputFolder);
        Assert.Equal(ExitCodes.InputError, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries), l => l.StartsWith("outputforge:", StringComparison.Ordinal));
        Assert.StartsWith("outputforge: error: ", line);
        Assert.Contains("t1.json:10:", line);
        Assert.Contains("$.endpoint.where", line);
        Assert.Contains("did you mean 'ANL01FL'?", line);
        Assert.DoesNotContain("   at ", error);
        Assert.False(Directory.Exists(study.OutputFolder));
    }

    [Fact]
    public void A_malformed_csv_gives_one_line_naming_file_and_line_and_leaves_old_outputs_alone()
    {
        using var study = new MiniStudy();
        Assert.Equal(0, Run("run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet").Code);
        var results = Path.Combine(study.OutputFolder, "results.json");
        var before = File.ReadAllBytes(results);

        File.WriteAllText(Path.Combine(study.DataFolder, "adeff.csv"), MiniStudy.Adeff + "T1,T1-001,RESP\n");
        var (code, error) = Run("run", "--spec", study.Folder, "--out", study.OutputFolder);
        Assert.Equal(ExitCodes.InputError, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries), l => l.StartsWith("outputforge:", StringComparison.Ordinal));
        Assert.Contains("adeff.csv line 6: the row has 3 fields but the header has 6", line);
        Assert.Equal(before, File.ReadAllBytes(results));
        Assert.Empty(Directory.GetDirectories(study.Folder, ".out.staging-*"));
    }

    [Fact]
    public void A_missing_spec_path_is_named()
    {
        using var folder = new TempFolder();
        var (code, error) = Run("run", "--spec", folder.File("nowhere.json"), "--out", folder.File("out"));
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("nowhere.json: $: no such spec file or folder", error);
    }

    [Fact]
    public void A_successful_run_logs_tables_and_time_on_stderr()
    {
        using var study = new MiniStudy();
        var (code, error) = Run("run", "--spec", study.Folder, "--out", study.OutputFolder);
        Assert.Equal(0, code);
        Assert.Contains("wrote table 1: table-1.docx, table-1.xlsx", error);
        Assert.Matches(@"1 table, 0 warnings, \d+ files in .* \(\d+\.\d\d s\)", error);
    }
}
