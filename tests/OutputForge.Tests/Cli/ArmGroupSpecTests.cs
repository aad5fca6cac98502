using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>treatment.groups of the study spec: a spanning header, or a located error when it cannot be drawn.</summary>
public sealed class ArmGroupSpecTests
{
    private static (int Code, string Error, MiniStudy Study) Run(string groups)
    {
        var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"control\": \"Placebo\" }", $"\"control\": \"Placebo\", \"groups\": {groups} }}"));
        var error = new StringWriter();
        var code = Program.Run(["run", "--spec", study.StudyFile, "--out", study.OutputFolder, "--format", "txt", "--quiet"], error);
        return (code, error.ToString(), study);
    }

    [Fact]
    public void A_group_prints_its_label_over_its_arms()
    {
        var (code, error, study) = Run("""[{ "label": "Active treatment", "arms": ["Active"] }]""");
        using (study)
        {
            Assert.True(code == 0, error);
            var text = File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt"));
            var lines = text.Split('\n').ToList();
            int group = lines.FindIndex(l => l.Contains("Active treatment", StringComparison.Ordinal));
            int arms = lines.FindIndex(l => l.Contains("Placebo", StringComparison.Ordinal) && l.Contains("Active", StringComparison.Ordinal) && !l.Contains("treatment", StringComparison.Ordinal));
            Assert.True(group >= 0 && group < arms, text);
        }
    }

    [Fact]
    public void An_arm_in_two_groups_is_a_located_spec_error()
    {
        var (code, error, study) = Run("""[{ "label": "A", "arms": ["Active"] }, { "label": "B", "arms": ["Active", "Placebo"] }]""");
        using (study)
        {
            Assert.Equal(ExitCodes.InputError, code);
            var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
            Assert.Contains("study.json:", line);
            Assert.Contains("treatment.groups[1]", line);
            Assert.Contains("already in the group 'A'", line);
        }
    }
}
