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
        var inputs = new InputOptionSet("Check only these tables, by id or pattern ('14.2.*'), comma-separated or repeated.");
        var command = new Command("check", "Check specs and data and report every problem at once, without producing tables; " +
            "it applies every rule of `run` and takes the options that change what a run reads.");
        inputs.AddTo(command);
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            if (!inputs.TryRead(parse, error, out var read))
            {
                return ExitCodes.Usage;
            }
            var report = PackageCheck.Run(parse.GetValue(inputs.Spec)!, parse.GetValue(inputs.Data), read);
            report.Write(output);
            return report.Errors == 0 ? ExitCodes.Success : ExitCodes.InputError;
        }));
        return command;
    }
}
