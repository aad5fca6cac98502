using System.Text.RegularExpressions;
using OutputForge.Tests.Support;
using OutputForge.Tests.Workflow;

namespace OutputForge.Tests.Cli;

/// <summary>The README's command table and each command's --help name the same options, so neither drifts from the other.</summary>
public sealed partial class ReadmeCommandTableTests
{
    /// <summary>The README's command rows: "| `outputforge run --spec ... [--quiet]` | ... |", by command ("run", "calc table").</summary>
    private static Dictionary<string, SortedSet<string>> ReadmeRows()
    {
        var rows = new Dictionary<string, SortedSet<string>>(StringComparer.Ordinal);
        foreach (var line in File.ReadLines(Path.Combine(RepositoryRoot.Path, "README.md")))
        {
            var row = ReadmeRow().Match(line);
            if (row.Success)
            {
                var usage = row.Groups["usage"].Value;
                var command = CommandWords().Match(usage).Groups["command"].Value.Trim();
                rows[command] = new SortedSet<string>(OptionNames().Matches(usage).Select(m => m.Value), StringComparer.Ordinal);
            }
        }
        return rows;
    }

    /// <summary>The long option names in a command's --help (without --help itself).</summary>
    private static SortedSet<string> HelpOptions(string command)
    {
        var (code, output, error) = WorkflowDemoFixture.Run([.. command.Split(' '), "--help"]);
        Assert.True(code == 0, error);
        var options = output[output.IndexOf("Options:", StringComparison.Ordinal)..];
        return new SortedSet<string>(HelpOption().Matches(options).Select(m => m.Groups["name"].Value).Where(n => n != "--help"), StringComparer.Ordinal);
    }

    [Theory]
    [InlineData("run")]
    [InlineData("demo")]
    [InlineData("check")]
    [InlineData("compare")]
    [InlineData("changes")]
    [InlineData("shells")]
    [InlineData("calc proportion")]
    [InlineData("calc difference")]
    [InlineData("calc table")]
    [InlineData("calc stratified")]
    [InlineData("calc multiplicity")]
    public void The_readme_row_and_the_help_name_the_same_options(string command)
    {
        var rows = ReadmeRows();
        Assert.True(rows.ContainsKey(command), $"the README's command table has no row for `outputforge {command}`");

        Assert.Equal(HelpOptions(command), rows[command]);
    }

    [Fact]
    public void Every_command_has_a_readme_row()
    {
        string[] commands = ["run", "demo", "check", "compare", "changes", "shells", "calc proportion", "calc difference", "calc table", "calc stratified", "calc multiplicity"];
        Assert.Equal(commands.Order(StringComparer.Ordinal), ReadmeRows().Keys.Order(StringComparer.Ordinal));
    }

    [GeneratedRegex(@"^\| `outputforge (?<usage>[a-z][^`]*)` \|")]
    private static partial Regex ReadmeRow();

    [GeneratedRegex(@"^(?<command>[a-z]+( [a-z]+)?)(?= |$)")]
    private static partial Regex CommandWords();

    [GeneratedRegex(@"--[a-z0-9][a-z0-9-]*")]
    private static partial Regex OptionNames();

    [GeneratedRegex(@"^\s+(-\S+, )*(?<name>--[a-z0-9-]+)", RegexOptions.Multiline)]
    private static partial Regex HelpOption();
}
