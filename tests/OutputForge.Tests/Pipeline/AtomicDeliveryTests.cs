using System.Security.Cryptography;
using OutputForge.Pipeline;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Pipeline;

/// <summary>
/// The output folder holds the whole previous package or the whole new one: a failure at any step of putting the new
/// package in place leaves the old one, a run killed between the two renames is recovered by the next run, and files
/// the run does not replace (other tables after --tables, the user's own) are carried into the new folder.
/// </summary>
public sealed class AtomicDeliveryTests
{
    private static Dictionary<string, string> Snapshot(string folder) =>
        Directory.GetFiles(folder, "*", SearchOption.AllDirectories)
            .ToDictionary(f => Path.GetRelativePath(folder, f), f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))));

    /// <summary>An old package of three files and a user's note in a subfolder.</summary>
    private static string OldPackage(TempFolder folder)
    {
        folder.Write("out/table-1.docx", "old 1");
        folder.Write("out/table-2.docx", "old 2");
        folder.Write("out/results.json", "old results");
        folder.Write("out/notes/readme.txt", "the user's own file");
        return folder.File("out");
    }

    private static OutputStaging Stage(string output, Action<string>? fault = null)
    {
        var staging = new OutputStaging(output) { BeforeStep = fault };
        foreach (var (name, text) in new[] { ("table-1.docx", "new 1"), ("results.json", "new results") })
        {
            using var stream = staging.Create(name);
            stream.Write(System.Text.Encoding.UTF8.GetBytes(text));
        }
        return staging;
    }

    [Theory]
    [InlineData("carry")]
    [InlineData("set aside")]
    [InlineData("swap")]
    public void A_failure_at_any_step_leaves_the_whole_previous_package(string step)
    {
        using var folder = new TempFolder();
        var output = OldPackage(folder);
        var before = Snapshot(output);
        using (var staging = Stage(output, s => { if (s == step) throw new IOException($"injected failure at {s}"); }))
        {
            var error = Assert.Throws<RunException>(() => staging.Commit());
            Assert.Contains($"injected failure at {step}", error.Message);
            Assert.Contains("the previous outputs are unchanged", error.Message);
        }
        Assert.Equal(before, Snapshot(output));
        Assert.Equal(["out"], Directory.GetFileSystemEntries(folder.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void A_successful_swap_gives_the_whole_new_package_with_the_files_it_does_not_replace()
    {
        using var folder = new TempFolder();
        var output = OldPackage(folder);
        using (var staging = Stage(output))
        {
            staging.Commit();
        }
        Assert.Equal("new 1", File.ReadAllText(Path.Combine(output, "table-1.docx")));
        Assert.Equal("new results", File.ReadAllText(Path.Combine(output, "results.json")));
        Assert.Equal("old 2", File.ReadAllText(Path.Combine(output, "table-2.docx")));
        Assert.Equal("the user's own file", File.ReadAllText(Path.Combine(output, "notes", "readme.txt")));
        Assert.Equal(["out"], Directory.GetFileSystemEntries(folder.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void A_run_killed_between_the_renames_is_recovered_by_the_next_run()
    {
        using var folder = new TempFolder();
        var output = OldPackage(folder);
        var before = Snapshot(output);
        // The state a kill after the first rename leaves: the old package set aside, a complete staging folder, no output folder.
        Directory.Move(output, folder.File(".out.previous-4242-0123456789abcdef0123456789abcdef"));
        folder.Write(".out.staging-4242-fedcba9876543210fedcba9876543210/table-1.docx", "new 1");

        using (var staging = new OutputStaging(output))
        {
            Assert.Equal(before, Snapshot(output));
            Assert.Equal([Path.GetFileName(staging.Folder), "out"], Directory.GetFileSystemEntries(folder.Path).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        }
    }

    [Fact]
    public void A_finished_swap_whose_old_package_was_not_deleted_is_cleaned_up()
    {
        using var folder = new TempFolder();
        var output = OldPackage(folder);
        folder.Write(".out.previous-4242-0123456789abcdef0123456789abcdef/table-1.docx", "older");
        var before = Snapshot(output);
        using (new OutputStaging(output))
        {
            Assert.Equal(before, Snapshot(output));
        }
        Assert.Equal(["out"], Directory.GetFileSystemEntries(folder.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void A_named_pipe_in_the_old_folder_stops_the_swap_and_leaves_the_old_package()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }
        using var folder = new TempFolder();
        var output = OldPackage(folder);
        using (var mkfifo = System.Diagnostics.Process.Start("mkfifo", [Path.Combine(output, "pipe")]))
        {
            mkfifo.WaitForExit();
        }
        using (var staging = Stage(output))
        {
            var error = Assert.Throws<RunException>(() => staging.Commit());
            Assert.Contains("pipe is a named pipe (FIFO), which cannot be carried into the new output folder", error.Message);
        }
        Assert.Equal("old 1", File.ReadAllText(Path.Combine(output, "table-1.docx")));
    }

    [Fact]
    public void A_run_with_tables_keeps_the_other_tables_files_through_the_swap()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson);
        File.WriteAllText(Path.Combine(study.Folder, "t2.json"), MiniStudy.TableJson.Replace("\"id\": \"1\"", "\"id\": \"2\""));
        File.WriteAllText(study.StudyFile, MiniStudy.StudyJson.Replace("[\"t1.json\"]", "[\"t1.json\", \"t2.json\"]"));
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], new StringWriter()));
        var table2 = File.ReadAllBytes(Path.Combine(study.OutputFolder, "table-2.docx"));

        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet", "--tables", "1",
            "--timestamp", "2026-12-01T09:00:00Z"], new StringWriter()));

        Assert.Equal(table2, File.ReadAllBytes(Path.Combine(study.OutputFolder, "table-2.docx")));
        Assert.Contains("2026-12-01", File.ReadAllText(Path.Combine(study.OutputFolder, "manifest.json")));
        var leftovers = Directory.GetFileSystemEntries(study.Folder, ".out.*").Where(e => OperatingSystem.IsLinux() || !e.EndsWith(".lock", StringComparison.Ordinal)).ToList();
        Assert.Empty(leftovers);
    }
}
