using OutputForge.Tests.Support;

namespace OutputForge.Tests.Populations;

/// <summary>
/// An arm with no subject in a table's population keeps its column, headed (N=0), with a warning that the table prints
/// as a footnote: an arm the study spec lists under treatment.arms, and an arm of the population that the table's subset
/// empties. Reviewers expect every randomized arm; a column that silently disappears would hide it.
/// </summary>
public sealed class EmptyArmTests
{
    private static string Run(MiniStudy study)
    {
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--format", "txt", "--quiet"], error);
        Assert.True(code == 0, error.ToString());
        return File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt"));
    }

    [Fact]
    public void A_listed_arm_without_subjects_shows_N_0_and_a_footnote()
    {
        var studyJson = MiniStudy.StudyJson.Replace("\"control\": \"Placebo\"",
            "\"control\": \"Placebo\", \"arms\": [{ \"value\": \"Placebo\", \"order\": 0 }, { \"value\": \"Active\", \"order\": 1 }, { \"value\": \"High\", \"order\": 2 }]");
        using var study = new MiniStudy(study: studyJson);
        var text = Run(study);
        Assert.Matches(@"\(N=2\)\s+\(N=2\)\s+\(N=0\)", text);
        Assert.Contains("Warning: arm High has no subjects in population 'itt': its column shows N=0.", text);
        // No test against an arm without subjects: an exact test would give p = 1, which says nothing.
        Assert.Matches(@"p-value \[c\]\s+>0\.999\s+NE\n", text);
        Assert.Contains("column high: no subjects in High.", text);
        var results = File.ReadAllText(Path.Combine(study.OutputFolder, "results.json"));
        Assert.Contains("\"high\"", results);
    }

    [Fact]
    public void An_arm_the_subset_empties_keeps_its_column()
    {
        var table = MiniStudy.TableJson.Replace("\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"TRT01P = 'Placebo'\",");
        using var study = new MiniStudy(table: table);
        var text = Run(study);
        Assert.Matches(@"Placebo\s+Active", text);
        Assert.Matches(@"\(N=2\)\s+\(N=0\)", text);
        Assert.Contains("Warning: arm Active has no subjects in population 'itt' with the subset TRT01P = 'Placebo': its column shows N=0.", text);
    }

    [Fact]
    public void Without_empty_arms_nothing_is_added()
    {
        using var study = new MiniStudy();
        var text = Run(study);
        Assert.DoesNotContain("N=0", text);
        Assert.DoesNotContain("has no subjects", text);
    }
}
