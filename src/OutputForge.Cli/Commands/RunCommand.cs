using System.CommandLine;
using OutputForge.Pipeline;
using OutputForge.Common;

namespace OutputForge.Cli.Commands;

/// <summary>`outputforge run`: every table of a study spec, from a data folder into an output folder.</summary>
public static class RunCommand
{
    public static Command Create(TextWriter error)
    {
        var inputs = new InputOptionSet("Only these tables, by id or pattern ('14.2.*'), comma-separated or repeated; the other tables' files, results and manifest entries in --out are kept.");
        var output = CommonOptions.Output("Folder for the tables and results.json (created if needed; files of the same name are replaced only when the whole run succeeds).");
        var formats = CommonOptions.Formats("results.json and manifest.json are always written.");
        var quiet = CommonOptions.Quiet();
        var verbose = CommonOptions.Verbose();
        var timestamp = CommonOptions.Timestamp();
        var combined = CommonOptions.Combined();
        var command = new Command("run", "Produce every table of a study spec: Word, Excel, results.json and manifest.json.");
        inputs.AddTo(command);
        foreach (var option in new Option[] { output, formats, quiet, verbose, timestamp, combined })
        {
            command.Options.Add(option);
        }
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var renderers = CommonOptions.Renderers(parse.GetValue(formats), error, out var valid);
            if (!valid || !CommonOptions.TryRunTime(parse.GetValue(timestamp), error, out var runTime)
                || !inputs.TryRead(parse, error, out var read))
            {
                return ExitCodes.Usage;
            }
            var log = CommonOptions.Log(error, parse.GetValue(quiet), parse.GetValue(verbose));
            PackageRunner.Run(new RunRequest(parse.GetValue(inputs.Spec)!, parse.GetValue(inputs.Data), parse.GetValue(output)!, renderers)
            {
                RunTime = runTime,
                Combined = parse.GetValue(combined),
                DataOptions = read.DataOptions,
                AllowedFolders = read.AllowedFolders,
                CommandLine = ["outputforge", .. parse.Tokens.Select(t => t.Value)],
                Tables = read.Tables,
            }, log);
            return ExitCodes.Success;
        }));
        return command;
    }
}
