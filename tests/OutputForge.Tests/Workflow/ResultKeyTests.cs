using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>results.json keys must name one number each, or QC files and run comparisons could not tell numbers apart.</summary>
public sealed class ResultKeyTests
{
    [Fact]
    public void ArmsWhoseKeysWouldClashAreRefused()
    {
        var adsl = MiniStudy.Adsl.Replace(",Active,", ",A/B,").Replace("T1,T1-002,Placebo,0,", "T1,T1-002,A B,2,");
        using var mini = new MiniStudy(adsl: adsl);

        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", mini.StudyFile, "--out", mini.OutputFolder, "--format", "txt"]);

        Assert.Equal(2, code);
        Assert.Contains("$.treatment.variable: arms 'A/B' and 'A B' of TRT01P have the same results key 'a-b'", error);
        Assert.False(File.Exists(Path.Combine(mini.OutputFolder, "results.json")));
    }
}
