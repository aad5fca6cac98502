using OutputForge.Pipeline;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Pipeline;

/// <summary>The run lock is taken on the real output folder, is not left beside it, and its failures say what is wrong.</summary>
public sealed class OutputLockTests
{
    [Fact]
    public void A_run_through_a_link_to_a_locked_folder_is_refused()
    {
        using var study = new MiniStudy();
        Directory.CreateDirectory(study.OutputFolder);
        var link = Path.Combine(study.Folder, "out-link");
        Directory.CreateSymbolicLink(link, study.OutputFolder);
        using (OutputLock.Acquire(study.OutputFolder))
        {
            var error = new StringWriter();
            var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", link, "--quiet"], error);
            Assert.Equal(OutputForge.Cli.ExitCodes.OutputError, code);
            Assert.Contains("another OutputForge run is writing to this folder", error.ToString());
        }
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", link, "--quiet"], new StringWriter()));
        // The run through the link wrote the real folder, and the link is still a link to it.
        Assert.True(File.Exists(Path.Combine(study.OutputFolder, "results.json")));
        Assert.NotNull(new DirectoryInfo(link).LinkTarget);
    }

    [Fact]
    public void The_lock_file_is_removed_after_the_run()
    {
        if (!OperatingSystem.IsLinux())
        {
            return;
        }
        using var folder = new TempFolder();
        using (OutputLock.Acquire(folder.File("out")))
        {
            Assert.True(File.Exists(folder.File(".out.lock")));
        }
        Assert.False(File.Exists(folder.File(".out.lock")));
        using (OutputLock.Acquire(folder.File("out")))
        {
            Assert.Throws<RunException>(() => OutputLock.Acquire(folder.File("out")));
        }
    }

    [Fact]
    public void A_part_of_the_path_that_is_a_file_is_named()
    {
        using var folder = new TempFolder();
        var file = folder.Write("report.txt", "a file");
        var error = Assert.Throws<RunException>(() => OutputLock.Acquire(Path.Combine(file, "sub", "out")));
        Assert.Contains($"{file} is a file, not a folder", error.Message);
        Assert.DoesNotContain("another OutputForge run", error.Message);
    }

    [Fact]
    public void An_output_name_too_long_for_the_staging_folder_says_so()
    {
        using var folder = new TempFolder();
        var error = Assert.Throws<RunException>(() => OutputLock.Acquire(folder.File(new string('a', 230))));
        Assert.Contains("the output folder's name is 230 bytes long; at most 195 fit", error.Message);
        Assert.DoesNotContain("another OutputForge run", error.Message);
    }

    [Fact]
    public void An_output_path_too_long_for_the_system_says_so()
    {
        using var folder = new TempFolder();
        var deep = Path.Combine([folder.Path, .. Enumerable.Repeat(new string('d', 150), 30), "out"]);
        var error = Assert.Throws<RunException>(() => OutputLock.Acquire(deep));
        Assert.Contains("the path is too long for this system", error.Message);
        Assert.DoesNotContain("another OutputForge run", error.Message);
    }

    [Fact]
    public void A_folder_without_write_permission_or_on_a_read_only_disk_is_named_as_such()
    {
        // Run as an administrator, a test cannot take a folder's write permission away: the messages are checked on the
        // errors the runtime raises for those cases (EACCES as UnauthorizedAccessException, EROFS as an IOException).
        using var folder = new TempFolder();
        var denied = OutputPlace.CannotWrite("tables", folder.Path, new UnauthorizedAccessException("Access to the path is denied."));
        Assert.Equal($"tables: no permission to write in {folder.Path} (Access to the path is denied.)", denied.Message);
        var readOnly = OutputPlace.CannotWrite("tables", folder.Path, new IOException("Read-only file system"));
        Assert.Equal($"tables: cannot write in {folder.Path} (Read-only file system)", readOnly.Message);
    }

    [Fact]
    public void An_output_folder_inside_the_data_folder_is_a_usage_error_naming_both()
    {
        using var study = new MiniStudy();
        var error = new StringWriter();
        var output = Path.Combine(study.DataFolder, "tables");
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--data", study.DataFolder, "--out", output], error);
        Assert.Equal(OutputForge.Cli.ExitCodes.Usage, code);
        Assert.Contains($"--out {output} is inside the data folder {study.DataFolder}", error.ToString());
        Assert.False(Directory.Exists(output));
    }

    [Fact]
    public void An_output_folder_through_a_link_into_the_data_folder_is_refused_too()
    {
        using var study = new MiniStudy();
        var link = Path.Combine(study.Folder, "data-link");
        Directory.CreateSymbolicLink(link, study.DataFolder);
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", Path.Combine(link, "tables")], error);
        Assert.Equal(OutputForge.Cli.ExitCodes.Usage, code);
        Assert.Contains("is inside the data folder", error.ToString());
        Assert.Equal(["adeff.csv", "adsl.csv"], Directory.GetFileSystemEntries(study.DataFolder).Select(Path.GetFileName).Order(StringComparer.Ordinal));
    }
}
