using System.CommandLine;
using OutputForge.Demo;
using OutputForge.Pipeline;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge demo`: writes the invented demo study (data and specs) into a folder and runs
/// every demo table, so a new user sees a whole package in one command.
/// </summary>
public static class DemoCommand
{
    public static Command Create(TextWriter error)
    {
        var output = CommonOptions.Output("Folder to write into: data/ (the invented study's CSV), specs/ (its specs) and output/ (the tables).");
        var subjects = new Option<int?>("--subjects")
        {
            Description = $"Number of randomized subjects of the invented study (default {new DemoStudyOptions().Subjects}, or {PooledStudyOptions.TargetSubjects} with --size pooled).",
        };
        var size = DemoSizeOption.Create();
        var noTables = new Option<bool>("--no-tables")
        {
            Description = "Write only the data and specs, without producing the tables (e.g. to time `run` on them separately).",
        };
        var loadCopies = new Option<int>("--load-copies")
        {
            Description = "Extra copies of the itch-score records in adeff.csv (parameters ITCHC01, ...) to enlarge the data for speed measurements; no demo table reads them.",
        };
        var dataFormat = new Option<string>("--data-format")
        {
            Description = "Format of the study's data files: csv, xpt (XPT version 5 transport) or json (CDISC Dataset-JSON 1.1).",
            DefaultValueFactory = _ => DemoDataFormat.Csv,
        };
        dataFormat.AcceptOnlyFromAmong([.. DemoDataFormat.All]);
        var formats = CommonOptions.Formats("results.json and manifest.json are always written.");
        var quiet = CommonOptions.Quiet();
        var verbose = CommonOptions.Verbose();
        var timestamp = CommonOptions.Timestamp();
        var combined = CommonOptions.Combined();
        var command = new Command("demo", "Write the invented demo study QF217-301 and produce all its tables.")
        {
            output, subjects, size, dataFormat, noTables, loadCopies, formats, quiet, verbose, timestamp, combined,
        };
        command.SetAction(parse => FailureReport.Guard(error, () =>
        {
            var renderers = CommonOptions.Renderers(parse.GetValue(formats), error, out var valid);
            if (!valid || !CommonOptions.TryRunTime(parse.GetValue(timestamp), error, out var runTime))
            {
                return ExitCodes.Usage;
            }
            var root = parse.GetValue(output)!;
            var log = CommonOptions.Log(error, parse.GetValue(quiet), parse.GetValue(verbose));
            var dataFolder = Path.Combine(root, "data");
            var studyFile = DemoPackageWriter.Write(root, DemoSizeOption.Options(parse.GetValue(size), parse.GetValue(subjects), parse.GetValue(loadCopies)),
                parse.GetValue(dataFormat)!);
            log.Info($"wrote the demo study's data to {dataFolder} and its specs to {Path.GetDirectoryName(studyFile)}");
            if (parse.GetValue(noTables))
            {
                return ExitCodes.Success;
            }
            PackageRunner.Run(new RunRequest(studyFile, dataFolder, Path.Combine(root, "output"), renderers)
            {
                RunTime = runTime,
                Combined = parse.GetValue(combined),
                CommandLine = ["outputforge", .. parse.Tokens.Select(t => t.Value)],
            }, log);
            return ExitCodes.Success;
        }));
        return command;
    }
}
