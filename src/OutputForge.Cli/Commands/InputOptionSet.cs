using System.CommandLine;
using OutputForge.Pipeline;

namespace OutputForge.Cli.Commands;

/// <summary>
/// The options that decide what a package reads (--spec, --data, --allow-folder, --control-characters, --tables),
/// made once for `run` and `check` alike, so that check takes every option that changes what a run accepts.
/// </summary>
public sealed class InputOptionSet
{
    public Option<string> Spec { get; } = new("--spec", "-s")
    {
        Description = "The study spec file, or the folder holding study.json.",
        Required = true,
    };

    public Option<string?> Data { get; } = new("--data", "-d")
    {
        Description = "Folder with the ADaM datasets as CSV (default: data.folder of the study spec).",
    };

    public Option<string[]> AllowFolder { get; } = new("--allow-folder")
    {
        Description = "A folder outside the spec's own folder tree that the spec may read from (e.g. a shared data folder named in data.folder); repeatable.",
    };

    public Option<string> ControlCharacters { get; } = CommonOptions.ControlCharacters();

    public Option<string[]> Tables { get; }

    /// <param name="tablesDescription">What --tables means for the command (a run keeps the other tables' files; check checks only these).</param>
    public InputOptionSet(string tablesDescription)
    {
        Tables = new Option<string[]>("--tables", "-t")
        {
            Description = tablesDescription,
            AllowMultipleArgumentsPerToken = true,
        };
    }

    public IEnumerable<Option> All => [Spec, Data, AllowFolder, ControlCharacters, Tables];

    public void AddTo(Command command)
    {
        foreach (var option in All)
        {
            command.Options.Add(option);
        }
    }

    /// <summary>The input options as parsed; false (after one line on stderr) for a value that is a usage error.</summary>
    public bool TryRead(ParseResult parse, TextWriter error, out PackageInputOptions options)
    {
        options = PackageInputOptions.Default;
        if (!CommonOptions.TryDataOptions(parse.GetValue(ControlCharacters), error, out var dataOptions)
            || !CommonOptions.TryTableSelection(parse, Tables, error, out var selected))
        {
            return false;
        }
        options = new PackageInputOptions
        {
            AllowedFolders = parse.GetValue(AllowFolder) ?? [],
            DataOptions = dataOptions,
            Tables = selected,
        };
        return true;
    }
}
