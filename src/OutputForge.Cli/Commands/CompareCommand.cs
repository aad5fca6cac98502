using System.CommandLine;
using OutputForge.Workflow.Compare;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge compare`: a QC statistician's independently programmed numbers against a
/// production run. Summary on stdout, the full report as .xlsx and .txt; exit code 0 only when
/// every QC number matched.
/// </summary>
public static class CompareCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var production = new Option<string>("--production", "-p")
        {
            Description = "The production run folder (or its results.json).",
            Required = true,
        };
        var qc = new Option<string>("--qc")
        {
            Description = "The QC file: CSV with columns table,row,column,statistic,value (see docs/qc-workflow.md).",
            Required = true,
        };
        var tolerance = new Option<string>("--tolerance")
        {
            Description = "For statistics other than counts: 'displayed' (agree when rounded as displayed; the default) or the largest absolute difference allowed, e.g. 0.001.",
            DefaultValueFactory = _ => CompareTolerance.DisplayedName,
        };
        var report = new Option<string?>("--report", "-r")
        {
            Description = "The report workbook to write (.xlsx; a .txt beside it). Default: <QC file>.compare.xlsx beside the QC file.",
        };
        var command = new Command("compare", "Compare a QC file of independently programmed numbers with a production run.")
        {
            production, qc, tolerance, report,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var rule = CompareTolerance.Parse(parse.GetValue(tolerance), out var problem);
            if (rule is null)
            {
                error.WriteLine($"outputforge: error: {problem}");
                return ExitCodes.Usage;
            }
            var qcFile = parse.GetValue(qc)!;
            var result = QcComparison.Run(parse.GetValue(production)!, qcFile, rule);
            var workbook = parse.GetValue(report) ?? Path.ChangeExtension(qcFile, ".compare.xlsx");
            CompareWorkbook.Save(result, workbook);
            var text = Path.ChangeExtension(workbook, ".txt");
            using (var writer = new StreamWriter(text))
            {
                CompareTextReport.Write(writer, result);
            }
            output.WriteLine(result.Summary);
            foreach (var mismatch in result.Checks.Where(c => c.Outcome != QcOutcome.Matched).Take(20))
            {
                output.WriteLine(mismatch.Outcome == QcOutcome.Mismatched
                    ? $"mismatch (QC line {mismatch.Line.Line}): {mismatch.Production!.Address}: production {mismatch.Production.Formatted}, QC {mismatch.Line.Value}"
                    : $"only in QC (line {mismatch.Line.Line}): {mismatch.Line.Address}: {mismatch.Reason}");
            }
            output.WriteLine($"report: {workbook}, {text}");
            return result.Passed ? ExitCodes.Success : ExitCodes.InputError;
        }));
        return command;
    }
}
