using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// The data files are read on all cores, but their errors are reported in the listed order (ADSL first, then by
/// dataset name), so the message a user sees does not depend on which file happened to finish first.
/// </summary>
public sealed class ParallelReadingTests
{
    private const string RaggedAdsl = MiniStudy.Adsl + "T1,T1-006,Placebo\n";
    private const string RaggedAdeff = MiniStudy.Adeff + "T1,T1-005\n";

    private static string FirstError(MiniStudy study)
    {
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], error);
        Assert.NotEqual(0, code);
        return error.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries)[0];
    }

    [Fact]
    public void With_two_bad_files_the_first_listed_one_is_reported_every_time()
    {
        for (var run = 0; run < 5; run++)
        {
            using var study = new MiniStudy(adsl: RaggedAdsl, adeff: RaggedAdeff);
            var first = FirstError(study);
            Assert.Contains("adsl.csv", first);
            Assert.Contains("line 7", first);
            Assert.DoesNotContain("adeff.csv", first);
        }
    }

    [Fact]
    public void A_bad_later_file_is_reported_with_its_own_line()
    {
        using var study = new MiniStudy(adeff: RaggedAdeff);
        var first = FirstError(study);
        Assert.Contains("adeff.csv", first);
        Assert.Contains("line 6", first);
    }
}
