using System.CommandLine;
using OutputForge.Workflow.Check;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge check`: validates a study's specs and data without producing tables and lists
/// every problem (errors, then warnings) with where it is and a fix hint. Exit code 0 when there
/// are no errors; warnings alone do not fail.
/// </summary>
public static class CheckCommand
{
    public static Command Create(TextWriter output, TextWriter error)
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
        var command = new Command("check", "Check specs and data and report every problem at once, without producing tables.")
        {
            spec, data,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var report = PackageCheck.Run(parse.GetValue(spec)!, parse.GetValue(data));
            report.Write(output);
            return report.Errors == 0 ? ExitCodes.Success : ExitCodes.InputError;
        }));
        return command;
    }
}
