using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Templates;

/// <summary>Templates as a study author meets them: overrides beside study.json, located errors, and the sandbox.</summary>
public sealed class TemplateTests
{
    private static (int Code, string Error) Run(MiniStudy study)
    {
        var error = new StringWriter();
        var code = Program.Run(["run", "--spec", study.StudyFile, "--out", study.OutputFolder, "--format", "txt",
            "--timestamp", "2026-12-01T09:00:00Z", "--quiet"], error);
        return (code, error.ToString());
    }

    private static MiniStudy WithTemplate(string name, string text)
    {
        var study = new MiniStudy();
        var folder = Path.Combine(study.Folder, "templates");
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, name), text);
        return study;
    }

    private static string Preview(MiniStudy study) =>
        File.ReadAllText(Directory.GetFiles(study.OutputFolder, "*.txt").Single());

    [Fact]
    public void The_built_in_templates_give_the_usual_title_block_and_source_line()
    {
        using var study = new MiniStudy();
        var (code, error) = Run(study);
        Assert.True(code == 0, error);
        var text = Preview(study);
        Assert.Contains("Table ", text);
        Assert.Matches(@"Source: [^\n]*; data: adsl\.csv \(SHA-256 [0-9a-f]{8}\)", text);
    }

    [Fact]
    public void A_study_template_replaces_the_built_in_one_and_sees_the_documented_variables()
    {
        using var study = WithTemplate("title.sbn",
            "Table {{ table.id }}: {{ table.titles[0] }}\n{{ for arm in population.arms }}{{ arm.label }} N={{ arm.n }}; {{ end }}\n{{ study.id }} {{ run.date }}\n");
        var (code, error) = Run(study);
        Assert.True(code == 0, error);
        var lines = Preview(study).Split('\n').Select(l => l.Trim()).ToList();
        Assert.Contains(lines, l => l.StartsWith("Table ", StringComparison.Ordinal) && l.Contains(": "));
        Assert.Contains(lines, l => l.Contains(" N=") && l.EndsWith(';'));
        Assert.Contains(lines, l => l.EndsWith("2026-12-01", StringComparison.Ordinal));
    }

    [Fact]
    public void A_syntax_error_is_one_line_naming_file_line_and_column_with_exit_code_2_and_no_output()
    {
        using var study = WithTemplate("page-footer.sbn", "Source line\n{{ for x in table.titles }}\n");
        var (code, error) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("outputforge: error: templates/page-footer.sbn:2:", line);
        Assert.False(Directory.Exists(study.OutputFolder) && Directory.EnumerateFiles(study.OutputFolder).Any());
    }

    [Fact]
    public void An_unknown_variable_is_a_located_error()
    {
        using var study = WithTemplate("continued.sbn", "Table {{ table.number }} (continued)\n");
        var (code, error) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("templates/continued.sbn:1:", error);
    }

    [Theory]
    [InlineData("{{ include '../study.json' }}")]
    [InlineData("{{ include '/etc/passwd' }}")]
    [InlineData("{{ include 'nothing-here.sbn' }}")]
    public void Include_reaches_only_templates_of_the_template_folders(string text)
    {
        using var study = WithTemplate("title.sbn", text);
        var (code, error) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("only a template of the template folders can be included", error);
    }

    [Fact]
    public void Include_of_a_study_template_by_name_works()
    {
        using var study = WithTemplate("title.sbn", "{{ include 'heading.sbn' }}\n{{ population.label }}\n");
        File.WriteAllText(Path.Combine(study.Folder, "templates", "heading.sbn"), "Tabelle {{ table.id }}");
        var (code, error) = Run(study);
        Assert.True(code == 0, error);
        Assert.Contains("Tabelle ", Preview(study));
    }

    [Theory]
    // No .NET object behind the variables: a string has no .NET members, and there is no date.now.
    [InlineData("{{ study.id.Length }}")]
    [InlineData("{{ date.now }}")]
    public void Templates_cannot_reach_dotnet_members_or_the_clock(string text)
    {
        using var study = WithTemplate("title.sbn", text);
        var (code, _) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
    }

    [Fact]
    public void An_endless_loop_stops_at_the_loop_limit()
    {
        using var study = WithTemplate("title.sbn", "{{ while true }}x{{ end }}");
        var (code, error) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("templates/title.sbn:1:", error);
    }

    [Fact]
    public void Endless_recursion_stops_at_the_recursion_limit()
    {
        using var study = WithTemplate("title.sbn", "{{ func f\n ret f }}\n{{ f }}");
        var (code, error) = Run(study);
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Contains("templates/title.sbn:", error);
    }
}
