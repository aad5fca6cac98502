using OutputForge.Rendering.Excel;

namespace OutputForge.Pipeline;

/// <summary>
/// Runs a whole table package, coordinating the steps: under the output folder's lock, prepare the run (specs, data,
/// inputs: <see cref="RunPreparation"/>), build every table (<see cref="TableRunLoop"/>, <see cref="TableBuilder"/>), and
/// deliver the files through a staging folder so that nothing reaches the output folder unless all of it succeeded
/// (<see cref="RunDelivery"/>).
/// </summary>
public static class PackageRunner
{
    public const string ResultsFileName = "results.json";

    public static RunSummary Run(RunRequest request, IRunLog log)
    {
        var clock = new RunClock();
        using var outputLock = OutputLock.Acquire(request.OutputFolder);
        var prepared = RunPreparation.Prepare(request, outputLock.Folder, clock, log);
        var selected = prepared.Selected;
        clock.StartStep();
        // With --tables the combined files still cover every table of the folder: the kept tables are rebuilt, and used only
        // where they come out byte for byte as the files kept in the folder (KeptTablesForCombined).
        var keptForCombined = request.Combined && request.Tables is not null
            ? prepared.Package.Tables.Where(t => !selected.Contains(t)).ToList()
            : [];
        var workbook = request.Combined && selected.Count > 0 && keptForCombined.Count == 0 && request.Renderers.Any(r => r is ExcelTableRenderer)
            ? new CombinedWorkbookBuilder(selected.Select(t => t.Id).ToList(), prepared.Facts.RunTime)
            : null;
        var builder = new TableBuilder(request, prepared);
        BuiltTable[] built;
        try
        {
            built = TableRunLoop.BuildAll(selected, builder, log, workbook);
        }
        catch
        {
            workbook?.AbandonAll();
            throw;
        }
        log.Detail($"tables: {built.Length} built in {clock.StepMilliseconds:0} ms on {Environment.ProcessorCount} cores");
        var keptLaidOut = keptForCombined.Count == 0
            ? []
            : KeptTablesForCombined.Rebuild(keptForCombined, request.OutputFolder, prepared.Facts,
                (table, keptRun) =>
                {
                    var kept = builder.Build(table, keptRun);
                    return (kept.Table, kept.Files);
                });
        log.Detail(CollectorFacts.Describe());
        foreach (var table in built)
        {
            foreach (var warning in table.Warnings)
            {
                log.Warning($"table {table.Table.Document.TableId}: {warning}");
            }
        }

        var files = RunDelivery.Deliver(request, prepared, built, keptLaidOut, workbook, log);
        log.Detail(CollectorFacts.Describe());
        foreach (var table in built.Select(b => b.Table))
        {
            var names = request.Renderers.Select(r => OutputFileNames.ForTable(table.Document.TableId, r.Extension)).ToList();
            if (table.Document.Figure is { } shown)
            {
                names.Add(OutputFileNames.ForFigure(table.Document.TableId, shown.Name));
            }
            log.Info($"wrote table {table.Document.TableId}: {string.Join(", ", names)}");
        }
        var warnings = built.Sum(t => t.Warnings.Count);
        log.Info($"{built.Length} table{(built.Length == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}, {files.Count} files in {request.OutputFolder} ({clock.Elapsed.TotalSeconds:0.00} s)");
        return new RunSummary(files, built.Length, warnings, clock.Elapsed);
    }
}
