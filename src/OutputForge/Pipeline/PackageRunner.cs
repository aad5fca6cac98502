using System.Diagnostics;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Spec;
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
        var package = SpecLoader.Load(request.SpecPath);
        var study = package.Study;
        var dataFolder = request.DataFolder ?? DefaultDataFolder(study);
        var data = StudyData.Load(study, dataFolder);
        log.Info($"read {data.Datasets.Count} datasets from {dataFolder}: " +
                 string.Join(", ", data.Datasets.Select(d => $"{d.Name} ({d.RowCount} rows)")));

        var inputs = RunInputs.Read(package, data);
        var selected = TableSelection.Select(study, package.Tables, request.Tables);
        var run = new RunFacts(request.RunTime ?? DateTimeOffset.UtcNow, ToolVersion.Text, inputs.SourceLineNames());
        var manifestTables = new List<ManifestTable>();
        var page = PageFrom(study.Page);
        var studyLine = StudyLine(study);
        var laidOut = new List<(LaidOutTable Table, IReadOnlyList<string> Warnings)>();
        foreach (var table in selected)
        {
            var result = TableAnalyses.For(table).Analyze(study, table, data);
            manifestTables.Add(new ManifestTable(table.Id, inputs.ForTable(result.Provenance.SpecFile, result.Provenance.Datasets),
                request.Renderers.Select(r => OutputFileNames.ForTable(table.Id, r.Extension)).ToList(), ManifestStaging.Timestamp(run.RunTime)));
            foreach (var warning in result.Warnings)
            {
                log.Warning($"table {table.Id}: {warning}");
            }
            laidOut.Add((TableLayoutBuilder.Build(result, studyLine, run, page), result.Warnings));
        }

        using var staging = new OutputStaging(request.OutputFolder);
        foreach (var (table, _) in laidOut)
        {
            foreach (var renderer in request.Renderers)
            {
                var name = OutputFileNames.ForTable(table.Document.TableId, renderer.Extension);
                using var stream = staging.Create(name);
                renderer.Write(table.Document, stream);
            }
        }
        using (var stream = staging.Create(ResultsFileName))
        {
            var kept = request.Tables is null ? null : KeptResults.Read(request.OutputFolder);
            ResultsJsonWriter.Write(stream, study.Study.Id, run, laidOut, kept, package.Tables.Select(t => t.Id).ToList());
        }
        var previous = request.Tables is not null && File.Exists(Path.Combine(request.OutputFolder, ManifestJson.FileName))
            ? ManifestJson.Read(request.OutputFolder)
            : null;
        ManifestStaging.Write(staging, request, dataFolder, study.Study.Id, run.RunTime, inputs, manifestTables, previous);
        var files = staging.Commit();
        foreach (var (table, _) in laidOut)
        {
            log.Info($"wrote table {table.Document.TableId}: {string.Join(", ", request.Renderers.Select(r => OutputFileNames.ForTable(table.Document.TableId, r.Extension)))}");
        }
        var warnings = laidOut.Sum(t => t.Warnings.Count);
        log.Info($"{laidOut.Count} table{(laidOut.Count == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}, {files.Count} files in {request.OutputFolder} ({clock.Elapsed.TotalSeconds:0.00} s)");
        return new RunSummary(files, laidOut.Count, warnings, clock.Elapsed);
    }

    private static string DefaultDataFolder(StudySpec study)
    {
        if (study.Data.Folder is null)
        {
            throw new SpecException(study.Source.Problem("/data",
                "no data folder: give --data on the command line or data.folder in the study spec"));
        }
        return Path.GetFullPath(Path.Combine(study.Folder, study.Data.Folder));
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
