using System.CommandLine;
using OutputForge.Workflow.Changes;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge changes`: what differs between two runs of a package (e.g. before and after
/// database lock): inputs by digest, tables number by number. Text on stdout, the same as .xlsx.
/// </summary>
public static class ChangesCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var before = new Option<string>("--before", "-b")
        {
            Description = "The earlier run folder (with results.json and manifest.json).",
            Required = true,
        };
        var after = new Option<string>("--after", "-a")
        {
            Description = "The later run folder.",
            Required = true,
        };
        var report = new Option<string?>("--report", "-r")
        {
            Description = "The report workbook to write (.xlsx; a .txt beside it). Default: changes.xlsx inside the --after folder.",
        };
        var command = new Command("changes", "Explain what changed between two runs: input files, tables and every changed number.")
        {
            before, after, report,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var afterFolder = parse.GetValue(after)!;
            var changes = RunComparison.Compare(parse.GetValue(before)!, afterFolder);
            // The report explains the --after run, so by default it goes with it, never beside it where it would land
            // among other folders (the parent of an output folder is often the project's own folder).
            var workbook = parse.GetValue(report) ?? Path.Combine(afterFolder, "changes.xlsx");
            ChangesWorkbook.Save(changes, workbook);
            var text = Path.ChangeExtension(workbook, ".txt");
            using (var writer = new StreamWriter(text))
            {
                ChangesTextReport.Write(writer, changes);
            }
            ChangesTextReport.Write(output, changes);
            output.WriteLine();
            output.WriteLine($"report: {workbook}, {text}");
            return ExitCodes.Success;
        }));
        return command;
    }
}
