using System.CommandLine;
using OutputForge.Workflow.Shells;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge shells`: mock tables for the statistical analysis plan, from the specs alone:
/// the tables' layout, titles and footnotes with placeholders of the right precision for numbers.
/// </summary>
public static class ShellsCommand
{
    public static Command Create(TextWriter error)
    {
        var spec = new Option<string>("--spec", "-s")
        {
            Description = "The study spec file, or the folder holding study.json (its treatment needs an 'arms' list).",
            Required = true,
        };
        var output = CommonOptions.Output("Folder for the shells (shell-<id>.docx, .xlsx, ...), created if needed.");
        var formats = CommonOptions.Formats();
        var quiet = CommonOptions.Quiet();
        var timestamp = CommonOptions.Timestamp();
        var tables = new Option<string[]>("--tables", "-t")
        {
            Description = "Only these tables, by id or pattern ('14.2.*'), comma-separated or repeated.",
            AllowMultipleArgumentsPerToken = true,
        };
        var command = new Command("shells", "Write mock shells of the tables (placeholders instead of numbers); needs no data.")
        {
            spec, output, formats, quiet, tables, timestamp,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var renderers = CommonOptions.Renderers(parse.GetValue(formats), error, out var valid);
            if (!valid || !CommonOptions.TryRunTime(parse.GetValue(timestamp), error, out var runTime)
                || !CommonOptions.TryTableSelection(parse, tables, error, out var selected))
            {
                return ExitCodes.Usage;
            }
            ShellPackage.Write(parse.GetValue(spec)!, parse.GetValue(output)!, renderers, selected,
                CommonOptions.Log(error, parse.GetValue(quiet), verbose: false), runTime);
            return ExitCodes.Success;
        }));
        return command;
    }
}
