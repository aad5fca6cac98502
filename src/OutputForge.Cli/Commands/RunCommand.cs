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
        var timestamp = CommonOptions.Timestamp();
        var combined = CommonOptions.Combined();
        var controlCharacters = CommonOptions.ControlCharacters();
        var command = new Command("run", "Produce every table of a study spec: Word, Excel and results.json.")
        {
            spec, data, output, formats, quiet, timestamp, combined, controlCharacters,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var renderers = CommonOptions.Renderers(parse.GetValue(formats), error, out var valid);
            if (!valid || !CommonOptions.TryRunTime(parse.GetValue(timestamp), error, out var runTime)
                || !CommonOptions.TryDataOptions(parse.GetValue(controlCharacters), error, out var dataOptions))
            {
                return ExitCodes.Usage;
            }
            var log = new StderrRunLog(error, parse.GetValue(quiet));
            PackageRunner.Run(new RunRequest(parse.GetValue(spec)!, parse.GetValue(data), parse.GetValue(output)!, renderers) { RunTime = runTime, DataOptions = dataOptions, Combined = parse.GetValue(combined) }, log);
            return ExitCodes.Success;
        }));
        return command;
    }
}
