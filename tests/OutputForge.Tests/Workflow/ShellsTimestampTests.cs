using System.Diagnostics;
using System.Security.Cryptography;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>Shells take --timestamp and SOURCE_DATE_EPOCH like a run: the same specs and time give the same bytes.</summary>
public sealed class ShellsTimestampTests
{
    private static Dictionary<string, string> Digests(string folder) =>
        Directory.GetFiles(folder).ToDictionary(f => Path.GetFileName(f), f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))));

    [Fact]
    public async Task The_same_specs_and_time_give_the_same_shells_from_the_option_or_the_environment()
    {
        using var folder = new TempFolder();
        var study = OutputForge.Demo.DemoSpecFiles.Write(folder.Path);
        var shells = new[] { "shells", "--spec", study, "--tables", "14.1.*,14.2.1.1", "--quiet" };

        foreach (var name in new[] { "a", "b" })
        {
            var (code, _, error) = WorkflowDemoFixture.Run([.. shells, "--out", folder.File(name), "--timestamp", "2025-12-01T09:00:00Z"]);
            Assert.True(code == 0, error);
        }
        // SOURCE_DATE_EPOCH is read from the process environment, so it is set for a separate process only.
        var program = Path.Combine(AppContext.BaseDirectory, "outputforge.dll");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true };
        foreach (var argument in (string[])[program, .. shells, "--out", folder.File("c")])
        {
            start.ArgumentList.Add(argument);
        }
        start.Environment["SOURCE_DATE_EPOCH"] = "1764579600";
        using (var process = Process.Start(start)!)
        {
            var error = process.StandardError.ReadToEndAsync();
            await process.StandardOutput.ReadToEndAsync();
            await process.WaitForExitAsync();
            Assert.True(process.ExitCode == 0, await error);
        }

        var a = Digests(folder.File("a"));
        Assert.NotEmpty(a);
        Assert.Equal(a, Digests(folder.File("b")));
        Assert.Equal(a, Digests(folder.File("c")));
    }
}
