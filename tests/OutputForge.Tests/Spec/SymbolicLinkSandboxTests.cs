using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Spec;

/// <summary>
/// Links inside the spec tree, the templates folder or the data folder cannot make OutputForge read files outside the
/// allowed folders, and a refused file's content never appears in a message or a document.
/// </summary>
public sealed class SymbolicLinkSandboxTests
{
    private const string Secret = "SECRET-LINE-never-to-be-shown";

    private static string Run(MiniStudy study, params string[] extra)
    {
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet", "--format", "txt", .. extra], error);
        return $"{code}: {error}";
    }

    [Fact]
    public void A_template_linked_to_a_file_outside_is_refused_and_not_shown()
    {
        using var outside = new TempFolder();
        var secret = outside.Write("passwords.sbn", Secret);
        using var study = new MiniStudy();
        Directory.CreateDirectory(Path.Combine(study.Folder, "templates"));
        File.CreateSymbolicLink(Path.Combine(study.Folder, "templates", "title.sbn"), secret);

        var result = Run(study);
        Assert.StartsWith("2: ", result);
        Assert.Contains("title.sbn: the template is a symbolic link that leads outside the spec's folder", result);
        Assert.DoesNotContain(Secret, result);
        Assert.False(Directory.Exists(study.OutputFolder));
        // Allowed explicitly, the same link is read.
        Assert.StartsWith("0: ", Run(study, "--allow-folder", outside.Path));
        Assert.Contains(Secret, File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt")));
    }

    [Fact]
    public void A_template_linked_inside_the_spec_tree_is_read()
    {
        using var study = new MiniStudy();
        File.WriteAllText(Path.Combine(study.Folder, "my-title.sbn"), "Linked title\n");
        Directory.CreateDirectory(Path.Combine(study.Folder, "templates"));
        File.CreateSymbolicLink(Path.Combine(study.Folder, "templates", "title.sbn"), Path.Combine(study.Folder, "my-title.sbn"));
        Assert.StartsWith("0: ", Run(study));
        Assert.Contains("Linked title", File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt")));
    }

    [Fact]
    public void A_table_spec_linked_to_a_file_outside_is_refused_without_reading_it()
    {
        using var outside = new TempFolder();
        var secret = outside.Write("t1.json", Secret);
        using var study = new MiniStudy();
        File.Delete(Path.Combine(study.Folder, "t1.json"));
        File.CreateSymbolicLink(Path.Combine(study.Folder, "t1.json"), secret);
        var error = Assert.Throws<SpecException>(() => SpecLoader.Load(study.Folder));
        Assert.Contains("$.tables[0]: 't1.json' is outside the spec's folder", error.Message);
        Assert.Contains("(through a symbolic link)", error.Message);
        Assert.DoesNotContain("SECRET", error.Message);
        // The first character of the file is not echoed either (as a JSON error about an invalid 'S' would).
        Assert.DoesNotContain("'S'", error.Message);
    }

    [Fact]
    public void A_spec_folder_linked_from_the_tree_to_outside_cannot_supply_the_data()
    {
        using var outside = new TempFolder();
        outside.Write("adsl.csv", MiniStudy.Adsl);
        outside.Write("adeff.csv", MiniStudy.Adeff);
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"folder\": \"data\"", "\"folder\": \"elsewhere\""));
        Directory.CreateSymbolicLink(Path.Combine(study.Folder, "elsewhere"), outside.Path);
        var result = Run(study);
        Assert.Contains("$.data.folder: 'elsewhere' is outside the spec's folder", result);
        Assert.Contains("(through a symbolic link)", result);

        var check = new StringWriter();
        OutputForge.Cli.Program.Run(["check", "--spec", study.Folder], check, check);
        Assert.Contains("'elsewhere' is outside the spec's folder", check.ToString());
    }

    [Fact]
    public void A_dataset_linked_out_of_the_data_folder_is_refused_unless_its_folder_is_allowed()
    {
        using var outside = new TempFolder();
        var adeff = outside.Write("adeff.csv", MiniStudy.Adeff);
        using var study = new MiniStudy();
        File.Delete(Path.Combine(study.DataFolder, "adeff.csv"));
        File.CreateSymbolicLink(Path.Combine(study.DataFolder, "adeff.csv"), adeff);
        var result = Run(study);
        Assert.Contains("adeff.csv: the file is a symbolic link that leads outside the data folder", result);

        var check = new StringWriter();
        OutputForge.Cli.Program.Run(["check", "--spec", study.Folder], check, check);
        Assert.Contains("symbolic link that leads outside the data folder", check.ToString());

        Assert.StartsWith("0: ", Run(study, "--allow-folder", outside.Path));
    }

    [Fact]
    public void The_folder_policy_compares_real_paths()
    {
        using var outside = new TempFolder();
        using var study = new MiniStudy();
        Directory.CreateSymbolicLink(Path.Combine(study.Folder, "out-link"), outside.Path);
        var policy = new SpecFolderPolicy(study.Folder);
        Assert.True(policy.Allows(Path.Combine(study.Folder, "t1.json")));
        Assert.False(policy.Allows(Path.Combine(study.Folder, "out-link", "x.json")));
        Assert.True(new SpecFolderPolicy(study.Folder, [outside.Path]).Allows(Path.Combine(study.Folder, "out-link", "x.json")));
    }
}
