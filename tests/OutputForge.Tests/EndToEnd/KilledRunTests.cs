using System.Diagnostics;
using System.Security.Cryptography;
using OutputForge.Demo;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>A run killed while it writes its outputs leaves the previous package exactly as it was.</summary>
public sealed class KilledRunTests
{
    private static Dictionary<string, string> Snapshot(string folder) =>
        Directory.GetFiles(folder).ToDictionary(f => Path.GetFileName(f), f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))));

    [Fact]
    public void Killing_a_run_while_it_writes_leaves_the_old_outputs_intact()
    {
        using var folder = new TempFolder();
        var studyFile = DemoSpecFiles.Write(folder.Path);
        var data = folder.File("data");
        DemoStudyGenerator.WriteCsv(data, new DemoStudyOptions(Subjects: 6000));
        var output = folder.File("output");
        // The responder tables only: enough outputs to kill the run while it writes them, and quick to build.
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", studyFile, "--data", data, "--out", output, "--quiet", "--tables", "14.2.1.*",
            "--timestamp", "2026-01-01T00:00:00Z"], new StringWriter()));
        var before = Snapshot(output);

        var program = Path.Combine(AppContext.BaseDirectory, "outputforge.dll");
        var start = new ProcessStartInfo("dotnet", ["exec", program, "run", "--spec", studyFile, "--data", data, "--out", output,
            "--format", "docx,xlsx,txt", "--quiet", "--tables", "14.2.1.*", "--timestamp", "2026-06-01T00:00:00Z"])
        {
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        using var process = Process.Start(start)!;
        // Drain stderr as it comes: a run with many warnings would otherwise block on a full pipe.
        process.ErrorDataReceived += (_, _) => { };
        process.BeginErrorReadLine();
        var clock = Stopwatch.StartNew();
        while (!process.HasExited && clock.Elapsed < TimeSpan.FromSeconds(60))
        {
            // Kill as soon as the staging folder appears: the run is then writing its outputs.
            if (Directory.GetDirectories(folder.Path, ".output.staging-*").Length > 0)
            {
                process.Kill(entireProcessTree: true);
                break;
            }
            Thread.Sleep(1);
        }
        if (!process.HasExited)
        {
            process.Kill(entireProcessTree: true);
        }
        process.WaitForExit();

        // Whenever the kill landed, the folder holds one whole package: the old one untouched, or
        // (if the run got to the end first) the new one exactly as its manifest lists it. A kill between the two
        // renames of the swap leaves no output folder, and the whole old package set aside beside it.
        var after = Snapshot(Directory.Exists(output) ? output : Directory.GetDirectories(folder.Path, ".output.previous-*").Single());
        if (!after.SequenceEqual(before))
        {
            using var manifest = System.Text.Json.JsonDocument.Parse(File.ReadAllText(Path.Combine(output, "manifest.json")));
            var listed = manifest.RootElement.GetProperty("outputs").EnumerateArray()
                .ToDictionary(o => o.GetProperty("name").GetString()!, o => o.GetProperty("sha256").GetString()!.ToUpperInvariant());
            Assert.Equal(listed.Keys.Order(), after.Keys.Where(k => k != "manifest.json").Order());
            Assert.All(listed, o => Assert.Equal(o.Value, after[o.Key]));
        }

        // The next run clears what the killed one left behind and completes.
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", studyFile, "--data", data, "--out", output, "--quiet", "--tables", "14.2.1.*"], new StringWriter()));
        Assert.Empty(Directory.GetDirectories(folder.Path, ".output.staging-*"));
        Assert.Empty(Directory.GetDirectories(folder.Path, ".output.previous-*"));
    }
}
