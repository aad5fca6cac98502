using System.CommandLine;
using OutputForge.Pipeline;

namespace OutputForge.Cli.Commands;

/// <summary>`outputforge run`: every table of a study spec, from a data folder into an output folder.</summary>
public static class RunCommand
{
    public static Command Create(TextWriter error)
    {
        var spec = new Option<string>("--spec", "-s")
        {
            Description = "The study spec file, or the folder holding study.json.",
            Required = true,
        };
        var data = new Option<string?>("--data", "-d")
        {
            Description = "Folder with the ADaM datasets as CSV (default: data.folder of the study spec).",
        };
        var output = CommonOptions.Output("Folder for the tables and results.json (created if needed; files of the same name are replaced only when the whole run succeeds).");
        var formats = CommonOptions.Formats();
        var quiet = CommonOptions.Quiet();
        var verbose = CommonOptions.Verbose();
        var timestamp = CommonOptions.Timestamp();
        var combined = CommonOptions.Combined();
        var controlCharacters = CommonOptions.ControlCharacters();
        var allowFolder = new Option<string[]>("--allow-folder")
        {
            Description = "A folder outside the spec's own folder tree that the spec may read from (e.g. a shared data folder named in data.folder); repeatable.",
        };
        var tables = new Option<string[]>("--tables", "-t")
        {
            Description = "Only these tables, by id or pattern ('14.2.*'), comma-separated or repeated; the other tables' files, results and manifest entries in --out are kept.",
            AllowMultipleArgumentsPerToken = true,
        };
        var command = new Command("run", "Produce every table of a study spec: Word, Excel, results.json and manifest.json.")
        {
            spec, data, output, formats, quiet, verbose, timestamp, combined, controlCharacters, allowFolder, tables,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var renderers = CommonOptions.Renderers(parse.GetValue(formats), error, out var valid);
            if (!valid || !CommonOptions.TryRunTime(parse.GetValue(timestamp), error, out var runTime)
                || !CommonOptions.TryDataOptions(parse.GetValue(controlCharacters), error, out var dataOptions)
                || !CommonOptions.TryTableSelection(parse, tables, error, out var selected))
            {
                return ExitCodes.Usage;
            }
            var log = CommonOptions.Log(error, parse.GetValue(quiet), parse.GetValue(verbose));
            PackageRunner.Run(new RunRequest(parse.GetValue(spec)!, parse.GetValue(data), parse.GetValue(output)!, renderers)
            {
                RunTime = runTime,
                Combined = parse.GetValue(combined),
                DataOptions = dataOptions,
                AllowedFolders = parse.GetValue(allowFolder) ?? [],
                CommandLine = ["outputforge", .. parse.Tokens.Select(t => t.Value)],
                Tables = selected,
            }, log);
            return ExitCodes.Success;
        }));
        return command;
    }
}
