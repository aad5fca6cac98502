using System.Diagnostics;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Excel;
using OutputForge.Spec;
using OutputForge.Templates;
using OutputForge.Workflow;
using OutputForge.Workflow.Manifest;

namespace OutputForge.Pipeline;

/// <summary>
/// Runs a whole table package: spec, data, every table's analysis and layout, every renderer,
/// and results.json, staged so that nothing reaches the output folder unless all of it succeeded.
/// </summary>
public static class PackageRunner
{
    public const string ResultsFileName = "results.json";

    public static RunSummary Run(RunRequest request, IRunLog log)
    {
        var clock = Stopwatch.StartNew();
        using var outputLock = OutputLock.Acquire(request.OutputFolder);
        var package = SpecLoader.Load(request.SpecPath, request.AllowedFolders);
        var study = package.Study;
        var templates = TemplateSet.Load(study.Folder, package.Folders);
        log.Detail($"specs: {package.Tables.Count} table specs read in {clock.Elapsed.TotalMilliseconds:0} ms");
        var dataFolder = PackageInputs.DataFolder(package, request.DataFolder);
        OutputPlace.CheckApart(request.OutputFolder, outputLock.Folder, dataFolder, study.Folder);
        // The selection is a command-line choice: a pattern that matches no table stops the run before any data is read.
        var selected = TableSelection.Select(package.Tables, request.Tables);
        var dataWarnings = new List<string>();
        var reading = Stopwatch.StartNew();
        // With --combined and --tables the kept tables are rebuilt too (below), so the run reads what every table uses.
        var projection = request.ReadEveryColumn ? null
            : RunColumns.For(study, request.Combined && request.Tables is not null ? package.Tables : selected);
        var data = StudyData.Load(study, dataFolder,
            request.DataOptions with { ReadableFolders = package.Folders.Folders, Projection = projection }, dataWarnings.Add);
        log.Detail($"data: {data.Datasets.Count} datasets, {data.Datasets.Sum(d => File.Exists(d.File) ? new FileInfo(d.File).Length : 0) / 1e6:0.0} MB read in {reading.Elapsed.TotalMilliseconds:0} ms");
        foreach (var line in DataReadFacts.Describe(data, projection is not null))
        {
            log.Detail(line);
        }
        log.Info($"read {data.Datasets.Count} datasets from {dataFolder}: " +
                 string.Join(", ", data.Datasets.Select(d => $"{d.Name} ({d.RowCount} rows)")));

        var digesting = Stopwatch.StartNew();
        var inputs = RunInputs.Read(package, data);
        log.Detail($"inputs: SHA-256 digests of the spec and data files in {digesting.Elapsed.TotalMilliseconds:0} ms");
        var run = new RunFacts(request.RunTime ?? DateTimeOffset.UtcNow, ToolVersion.Text, inputs.SourceLineNames())
        {
            DataDigests = inputs.Data.Where(d => d.Dataset is not null)
                .ToDictionary(d => d.Dataset!, d => FileDigest.Short(d.Sha256), StringComparer.Ordinal),
        };
        var page = PageFrom(study.Page);
        var studyLine = StudyLine(study);
        var building = Stopwatch.StartNew();
        var context = new LayoutContext(templates, ColumnGroupsOf(study));
        // With --tables the combined files still cover every table of the folder: the kept tables are rebuilt, and used only
        // where they come out byte for byte as the files kept in the folder (KeptTablesForCombined).
        var keptForCombined = request.Combined && request.Tables is not null
            ? package.Tables.Where(t => !selected.Contains(t)).ToList()
            : [];
        var workbook = request.Combined && selected.Count > 0 && keptForCombined.Count == 0 && request.Renderers.Any(r => r is ExcelTableRenderer)
            ? new CombinedWorkbookBuilder(selected.Select(t => t.Id).ToList(), run.RunTime)
            : null;
        BuiltTable[] built;
        try
        {
            built = BuildTables(selected, request, study, data, dataWarnings, inputs, run, studyLine, page, context, log, workbook);
        }
        catch
        {
            workbook?.AbandonAll();
            throw;
        }
        log.Detail($"tables: {built.Length} built in {building.Elapsed.TotalMilliseconds:0} ms on {Environment.ProcessorCount} cores");
        var keptLaidOut = keptForCombined.Count == 0
            ? []
            : KeptTablesForCombined.Rebuild(keptForCombined, request.OutputFolder, run,
                (table, keptRun) =>
                {
                    var kept = BuildTable(table, request, study, data, dataWarnings, inputs, keptRun, studyLine, page, context);
                    return (kept.Table, kept.Files);
                });
        log.Detail(CollectorFacts.Describe());
        var writing = new StageTimes();
        var manifestTables = built.Select(b => b.Manifest).ToList();
        var laidOut = built.Select(b => (b.Table, b.Warnings)).ToList();
        foreach (var table in built)
        {
            foreach (var warning in table.Warnings)
            {
                log.Warning($"table {table.Table.Document.TableId}: {warning}");
            }
        }

        using var staging = new OutputStaging(request.OutputFolder);
        foreach (var table in built)
        {
            foreach (var (name, bytes) in table.Files)
            {
                using var stream = staging.Create(name);
                stream.Write(bytes);
            }
        }
        writing.Lap("table files");
        // The combined documents and results.json are rendered at the same time (each on its own core), then staged in
        // the fixed order: combined documents, results.json.
        IReadOnlyList<(string Name, byte[] Bytes)> combined = [];
        byte[] results = [];
        InOrderParallel.Invoke(
            () =>
            {
                if (request.Combined && laidOut.Count > 0)
                {
                    combined = CombinedOutputs.Render(request.Renderers, [.. laidOut.Select(t => t.Table), .. keptLaidOut], run.RunTime, workbook);
                }
            },
            () =>
            {
                using var buffer = new MemoryStream();
                var kept = request.Tables is null ? null : KeptResults.Read(request.OutputFolder);
                ResultsJsonWriter.Write(buffer, study.Study.Id, run, laidOut, kept, package.Tables.Select(t => t.Id).ToList());
                results = buffer.ToArray();
            });
        foreach (var (name, bytes) in combined.Append((ResultsFileName, results)))
        {
            using var stream = staging.Create(name);
            stream.Write(bytes);
        }
        writing.Lap("combined and results.json");
        if (workbook is not null)
        {
            log.Detail($"combined workbook (built beside the tables): {workbook.Times}");
        }
        var previous = request.Tables is not null && File.Exists(Path.Combine(request.OutputFolder, ManifestJson.FileName))
            ? ManifestJson.Read(request.OutputFolder)
            : null;
        ManifestStaging.Write(staging, request, dataFolder, study.Study.Id, run.RunTime, inputs, manifestTables, previous);
        writing.Lap("manifest");
        var files = staging.Commit();
        writing.Lap("commit");
        log.Detail($"after the tables: {writing}");
        log.Detail(CollectorFacts.Describe());
        foreach (var (table, _) in laidOut)
        {
            var names = request.Renderers.Select(r => OutputFileNames.ForTable(table.Document.TableId, r.Extension)).ToList();
            if (table.Document.Figure is { } shown)
            {
                names.Add(OutputFileNames.ForFigure(table.Document.TableId, shown.Name));
            }
            log.Info($"wrote table {table.Document.TableId}: {string.Join(", ", names)}");
        }
        var warnings = laidOut.Sum(t => t.Warnings.Count);
        log.Info($"{laidOut.Count} table{(laidOut.Count == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}, {files.Count} files in {request.OutputFolder} ({clock.Elapsed.TotalSeconds:0.00} s)");
        return new RunSummary(files, laidOut.Count, warnings, clock.Elapsed);
    }

    /// <summary>What every table's layout shares: the run's templates and the study's arm groups.</summary>
    private sealed record LayoutContext(TemplateSet Templates, IReadOnlyList<ColumnGroup> Groups);

    /// <summary>The study's arm groups, keyed like the result columns (the arm value as a results key).</summary>
    public static IReadOnlyList<ColumnGroup> ColumnGroupsOf(StudySpec study) =>
        (study.Treatment.Groups ?? [])
            .Select((g, i) => new ColumnGroup(g.Label, g.Arms.Select(ResultKeys.FromLabel).ToList(), $"/treatment/groups/{i}"))
            .ToList();

    /// <summary>One table analysed, laid out and rendered (to bytes, not yet written).</summary>
    private sealed record BuiltTable(LaidOutTable Table, IReadOnlyList<string> Warnings, ManifestTable Manifest,
        IReadOnlyList<(string Name, byte[] Bytes)> Files, StageTimes Times);

    /// <summary>
    /// Builds the tables in parallel (each reads the shared, immutable datasets) and returns them in
    /// package order. When tables fail, the first failing table's error is the one reported, so the
    /// message does not depend on thread timing.
    /// </summary>
    private static BuiltTable[] BuildTables(IReadOnlyList<TableSpec> selected, RunRequest request, StudySpec study, StudyData data,
        IReadOnlyList<string> dataWarnings, RunInputs inputs, RunFacts run, string studyLine, PageSettings page, LayoutContext context, IRunLog log,
        CombinedWorkbookBuilder? workbook)
    {
        var built = new BuiltTable[selected.Count];
        var done = 0;
        // The tables already keep every core busy; MathNet's own threads inside a factorization would only contend with
        // them (spinning and waiting). Each column of its algorithms is computed the same way on one thread.
        MathNet.Numerics.Control.UseSingleThread();
        InOrderParallel.For(selected.Count, i =>
        {
            try
            {
                var clock = Stopwatch.StartNew();
                built[i] = BuildTable(selected[i], request, study, data, dataWarnings, inputs, run, studyLine, page, context);
                workbook?.Ready(i, built[i].Table);
                log.Detail($"table {selected[i].Id}: built in {clock.Elapsed.TotalMilliseconds:0} ms ({built[i].Times})");
            }
            catch
            {
                workbook?.Abandon(i);
                throw;
            }
            finally
            {
                log.Progress(Interlocked.Increment(ref done), selected.Count, selected[i].Id);
            }
        }, TableWorkOrder.Of(selected));
        return built;
    }

    private static BuiltTable BuildTable(TableSpec table, RunRequest request, StudySpec study, StudyData data,
        IReadOnlyList<string> dataWarnings, RunInputs inputs, RunFacts run, string studyLine, PageSettings page, LayoutContext context)
    {
        var times = new StageTimes();
        var result = Kinds.TableKinds.For(table).Analysis.Analyze(study, table, data);
        times.Lap("analysis");
        if (dataWarnings.Count > 0)
        {
            result = result with { Warnings = [.. dataWarnings, .. result.Warnings] };
        }
        var outputNames = request.Renderers.Select(r => OutputFileNames.ForTable(table.Id, r.Extension)).ToList();
        if (result.Figure is { } figure)
        {
            outputNames.Add(OutputFileNames.ForFigure(table.Id, figure.Name));
        }
        var manifest = new ManifestTable(table.Id, inputs.ForTable(result.Provenance.SpecFile, result.Provenance.Datasets),
            outputNames, ManifestStaging.Timestamp(run.RunTime));
        var laidOut = TableLayOut.Build(study, table, result, studyLine, run, page, NumberDisplay.Values, context.Templates,
            document => TemplateValues.For(study, table, result, document, run));
        times.Lap("layout");
        if (DocumentText.FirstProblem(laidOut.Document) is { } problem)
        {
            // Each source is checked where it is read; this catches text assembled from several pieces.
            throw new SpecException(table.Source.Problem(string.Empty, $"the laid-out table cannot be written: {problem}"));
        }
        var files = new List<(string, byte[])>();
        foreach (var renderer in request.Renderers)
        {
            using var buffer = new MemoryStream();
            renderer.Write(laidOut.Document, buffer);
            var bytes = buffer.ToArray();
            if (PackageNormalizer.IsPackage(bytes))
            {
                bytes = PackageNormalizer.Normalize(bytes, run.RunTime);
            }
            files.Add((OutputFileNames.ForTable(table.Id, renderer.Extension), bytes));
            times.Lap(renderer.Extension.TrimStart('.'));
        }
        if (result.Figure is { } picture)
        {
            files.Add((OutputFileNames.ForFigure(table.Id, picture.Name), picture.Png));
        }
        return new BuiltTable(laidOut, TableNotes.Of(result).Warnings, manifest, files, times);
    }

    /// <summary>The study identification of the page header: "QF217-301 (Sponsor)".</summary>
    public static string StudyLine(StudySpec study) =>
        $"{study.Study.Id}" + (study.Study.Sponsor is null ? string.Empty : $" ({study.Study.Sponsor})");

    public static PageSettings PageFrom(PageSpec? spec)
    {
        var page = PageSettings.Default;
        if (spec is null)
        {
            return page;
        }
        return page with
        {
            Paper = spec.Paper == "a4" ? PaperSize.A4 : PaperSize.Letter,
            Orientation = spec.Orientation == "portrait" ? PageOrientation.Portrait : PageOrientation.Landscape,
            FontName = spec.Font ?? page.FontName,
            FontSizePoints = spec.FontSize ?? page.FontSizePoints,
        };
    }
}
