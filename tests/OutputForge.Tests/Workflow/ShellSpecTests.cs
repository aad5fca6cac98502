using OutputForge.Tests.Support;
using OutputForge.Workflow.Shells;

namespace OutputForge.Tests.Workflow;

/// <summary>Shells of small specs without data: precision from the spec, templates, located errors, and kinds' variants.</summary>
public sealed class ShellSpecTests
{
    private static readonly string StudyWithArms = MiniStudy.StudyJson.Replace("\"control\": \"Placebo\" }",
        "\"control\": \"Placebo\", \"arms\": [{ \"value\": \"Placebo\", \"order\": 0 }, { \"value\": \"Active\", \"order\": 1 }] }");

    private static (int Code, string Error, List<List<string>> Rows) Shell(MiniStudy mini)
    {
        Directory.Delete(mini.DataFolder, recursive: true);
        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", mini.StudyFile, "--out", mini.OutputFolder, "--format", "docx,xlsx"]);
        var file = Path.Combine(mini.OutputFolder, "shell-1.docx");
        return (code, error, File.Exists(file) ? DocumentReader.WordTableRows(file) : []);
    }

    private static Dictionary<string, string[]> ByLabel(List<List<string>> rows) =>
        rows.Where(r => r[0].Length > 0).GroupBy(r => r[0]).ToDictionary(g => g.Key, g => g.First().Skip(1).ToArray());

    private static void AllPlaceholders(List<List<string>> rows)
    {
        var header = rows.FindIndex(r => r.Any(c => c == "(N=xx)"));
        Assert.True(header >= 0);
        Assert.All(rows.Skip(header + 1).SelectMany(r => r.Skip(1)), text => Assert.Matches(ShellCellPattern.Placeholders(), text));
    }

    [Fact]
    public void An_arm_in_two_groups_is_a_located_spec_error_in_shells_too()
    {
        using var mini = new MiniStudy(study: StudyWithArms.Replace("\"arms\": [", "\"groups\": [{ \"label\": \"A\", \"arms\": [\"Active\"] }, { \"label\": \"B\", \"arms\": [\"Active\", \"Placebo\"] }], \"arms\": ["));

        var (code, error, _) = Shell(mini);

        Assert.Equal(2, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("study.json:", line);
        Assert.Contains("treatment.groups[1]", line);
        Assert.Contains("table 1: the arm", line);
        Assert.Contains("already in the group 'A'", line);
        Assert.False(Directory.Exists(mini.OutputFolder));
    }

    [Fact]
    public void A_population_no_stand_in_subject_can_meet_is_a_located_spec_error()
    {
        using var mini = new MiniStudy(study: StudyWithArms.Replace("\"where\": \"ITTFL = 'Y'\"", "\"where\": \"AGE > 5 and AGE < 5\""));

        var (code, error, _) = Shell(mini);

        Assert.Equal(2, code);
        Assert.Contains("$.populations.itt.where: no stand-in record meets \"AGE > 5 and AGE < 5\"", error);
    }

    [Fact]
    public void The_studys_templates_make_the_printed_texts_with_no_stand_in_number()
    {
        using var mini = new MiniStudy(study: StudyWithArms);
        Directory.CreateDirectory(Path.Combine(mini.Folder, "templates"));
        File.WriteAllText(Path.Combine(mini.Folder, "templates", "title.sbn"),
            "Mock {{ table.id }}: {{ for a in population.arms }}{{ a.label }} N={{ a.n }}; {{ end }}warnings {{ table.warnings | array.size }}\n");

        var (code, error, _) = Shell(mini);

        Assert.True(code == 0, error);
        var paragraphs = DocumentReader.WordParagraphs(Path.Combine(mini.OutputFolder, "shell-1.docx"));
        Assert.Contains("Mock 1: Placebo N=xx; Active N=xx; warnings 0", paragraphs);
        // The built-in source line: the shell names no data file.
        Assert.Contains("Source: t1.json; data: none (mock shell); run ", DocumentReader.WordFooterText(Path.Combine(mini.OutputFolder, "shell-1.docx")));
    }

    [Fact]
    public void Demographics_decimals_follow_the_specs_data_decimals_and_levels_from_the_data_are_one_row()
    {
        const string table = """
            { "id": "1", "title": ["Demographics"], "population": "itt", "kind": "demographics",
              "demographics": { "variables": [
                { "variable": "AGE", "type": "continuous", "label": "Age", "dataDecimals": 1, "test": "anova" },
                { "variable": "SEX", "type": "categorical", "label": "Sex", "test": "fisher" } ] } }
            """;
        using var mini = new MiniStudy(study: StudyWithArms, table: table);

        var (code, error, rows) = Shell(mini);

        Assert.True(code == 0, error);
        Assert.DoesNotContain("dataDecimals", error);
        var byLabel = ByLabel(rows);
        // One decimal as collected: mean and median two, SD three, min and max one (common practice).
        Assert.Equal(["x.xx (x.xxx)", "x.xx (x.xxx)", ""], byLabel["Mean (SD)"]);
        Assert.Equal(["x.x, x.x", "x.x, x.x", ""], byLabel["Min, Max"]);
        Assert.Equal(["", "", "0.xxx"], byLabel["Age"]);
        Assert.Equal(["Sex", "xxxxxxxx"], rows.Select(r => r[0]).SkipWhile(l => l != "Sex"));
        AllPlaceholders(rows);
    }

    [Fact]
    public void Time_to_event_without_times_or_strata_has_every_statistic_of_its_layout()
    {
        const string table = """
            { "id": "1", "title": ["Time to event"], "population": "itt", "kind": "time-to-event",
              "endpoint": { "dataset": "adeff", "parameter": "TTE", "label": "Time to event" },
              "timeToEvent": { "decimals": 0, "hazardRatioDecimals": 3 } }
            """;
        using var mini = new MiniStudy(study: StudyWithArms, table: table);

        var (code, error, rows) = Shell(mini);

        Assert.True(code == 0, error);
        var byLabel = ByLabel(rows);
        Assert.Equal(["x", "x"], byLabel["Median"]);
        Assert.Equal(["(x, x)", "(x, x)"], byLabel["95% CI"]);
        // Footnotes are lettered in order of first reference: without times there is no Kaplan-Meier-at-times
        // footnote, so the log-rank test is [b] and the hazard ratio [c] (no gap in the letters).
        Assert.Equal(["", "x.xxx"], byLabel["Hazard ratio [c]"]);
        Assert.DoesNotContain(rows, r => r[0].StartsWith("No record", StringComparison.Ordinal));
        AllPlaceholders(rows);
    }

    [Fact]
    public void Continuous_without_baseline_or_model_shows_the_value_rows_of_each_listed_visit()
    {
        const string table = """
            { "id": "1", "title": ["Values by visit"], "population": "itt", "kind": "continuous",
              "endpoint": { "dataset": "adeff", "parameter": "SCORE", "where": "ANL01FL = 'Y'" },
              "continuous": { "visits": ["Day 1", "Day 8"], "baseline": null, "change": null, "decimals": 2 } }
            """;
        using var mini = new MiniStudy(study: StudyWithArms, table: table);

        var (code, error, rows) = Shell(mini);

        Assert.True(code == 0, error);
        var labels = rows.Select(r => r[0]).ToList();
        Assert.Contains("Value at Day 1", labels);
        Assert.Contains("Value at Day 8", labels);
        Assert.DoesNotContain("Baseline", labels);
        Assert.Equal(["x.xxx (x.xxxx)", "x.xxx (x.xxxx)"], ByLabel(rows)["Mean (SD)"]);
        AllPlaceholders(rows);
    }

    [Fact]
    public void The_validation_specs_have_shells_once_their_arms_are_listed()
    {
        using var folder = new TempFolder();
        var source = Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01");
        foreach (var file in Directory.GetFiles(source, "*.json", SearchOption.AllDirectories))
        {
            folder.Write(Path.GetRelativePath(source, file), File.ReadAllText(file));
        }
        var studyFile = folder.File("study.json");
        var study = File.ReadAllText(studyFile);
        Assert.Contains("\"control\": \"Placebo\", \"total\": false,", study);
        File.WriteAllText(studyFile, study.Replace("\"control\": \"Placebo\", \"total\": false,",
            "\"control\": \"Placebo\", \"total\": false, \"arms\": [{ \"value\": \"Placebo\", \"order\": 0 }, { \"value\": \"Xanomeline Low Dose\", \"order\": 1 }, { \"value\": \"Xanomeline High Dose\", \"order\": 2 }],"));
        var output = folder.File("shells");

        var (code, _, error) = WorkflowDemoFixture.Run(["shells", "--spec", studyFile, "--out", output, "--format", "docx"]);

        Assert.True(code == 0, error);
        foreach (var id in new[] { "14-1.01", "14-2.01" })
        {
            var rows = DocumentReader.WordTableRows(Path.Combine(output, $"shell-{id}.docx"));
            AllPlaceholders(rows);
        }
        var demographics = ByLabel(DocumentReader.WordTableRows(Path.Combine(output, "shell-14-2.01.docx")));
        // The table's own decimals (mean 1, SD 2), whole percentages with a sign, p-values to 4 decimals (pValueFloor 0.0001).
        Assert.Equal(["x.x", "x.x", "x.x", "x.x", ""], demographics["Mean"]);
        Assert.Equal(["x.xx", "x.xx", "x.xx", "x.xx", ""], demographics["SD"]);
        Assert.Equal(["x (xx%)", "x (xx%)", "x (xx%)", "x (xx%)", ""], demographics["Male"]);
        Assert.Equal(["", "", "", "", "0.xxxx"], demographics["Sex"]);
        Assert.DoesNotContain("dataDecimals", error);
    }
}
