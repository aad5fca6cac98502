using System.Security.Cryptography;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.BadInput;

/// <summary>
/// Every malformed input gives a clear error (naming the file and the line or JSON path, and what
/// was expected), a non-zero exit code, no stack trace, and leaves the previous outputs untouched.
/// </summary>
public sealed class BadInputTests
{
    public static TheoryData<BadInputCase> Cases()
    {
        var data = new TheoryData<BadInputCase>();
        foreach (var item in BadInputCases.All())
        {
            data.Add(item);
        }
        return data;
    }

    [Fact]
    public void The_battery_has_at_least_a_hundred_cases() => Assert.True(BadInputCases.All().Count() >= 100);

    private static Dictionary<string, string> Snapshot(string folder) =>
        Directory.GetFiles(folder).ToDictionary(f => Path.GetFileName(f), f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))));

    [Theory]
    [MemberData(nameof(Cases))]
    public void Bad_input_gives_one_clear_line_and_keeps_the_old_outputs(BadInputCase input)
    {
        using var study = new MiniStudy();
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], new StringWriter()));
        var before = Snapshot(study.OutputFolder);

        input.Apply(study);
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", input.Out?.Invoke(study) ?? study.OutputFolder, "--quiet", .. input.ExtraArguments], error);
        var text = error.ToString();

        Assert.True(code != 0, $"{input.Name}: exit code 0");
        Assert.DoesNotContain("   at ", text);
        Assert.DoesNotContain("Exception", text);
        var first = text.Split('\n', StringSplitOptions.RemoveEmptyEntries).FirstOrDefault(l => l.Contains("error", StringComparison.OrdinalIgnoreCase)) ?? text;
        foreach (var fragment in input.Expect)
        {
            Assert.True(first.Contains(fragment, StringComparison.Ordinal), $"{input.Name}: expected '{fragment}' in: {first}");
        }
        Assert.Equal(before, Snapshot(study.OutputFolder));
        // No staging or set-aside folder is left, nor the lock file (kept only where /proc cannot tell it is safe to remove).
        var leftovers = Directory.GetFileSystemEntries(study.Folder, ".out.*").Where(e => OperatingSystem.IsLinux() || !e.EndsWith(".lock", StringComparison.Ordinal)).ToList();
        Assert.Empty(leftovers);
    }
}
