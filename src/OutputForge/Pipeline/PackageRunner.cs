using System.Diagnostics;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Spec;
using OutputForge.Templates;

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
        var package = SpecLoader.Load(request.SpecPath);
        var study = package.Study;
        var templates = TemplateSet.Load(study.Folder);
        var dataFolder = request.DataFolder ?? DefaultDataFolder(study);
        var dataWarnings = new List<string>();
        var data = StudyData.Load(study, dataFolder, request.DataOptions, dataWarnings.Add);
        log.Info($"read {data.Datasets.Count} datasets from {dataFolder}: " +
                 string.Join(", ", data.Datasets.Select(d => $"{d.Name} ({d.RowCount} rows)")));

        var run = new RunFacts(request.RunTime ?? DateTimeOffset.UtcNow, ToolVersion.Text,
            study.Data.Datasets.ToDictionary(d => d.Key, d => d.Value, StringComparer.Ordinal))
        {
            DataDigests = study.Data.Datasets
                .Where(d => File.Exists(Path.Combine(dataFolder, d.Value)))
                .ToDictionary(d => d.Key, d => FileDigest.Short(Path.Combine(dataFolder, d.Value)), StringComparer.Ordinal),
        };
        var page = PageFrom(study.Page);
        var studyLine = $"{study.Study.Id}" + (study.Study.Sponsor is null ? string.Empty : $" ({study.Study.Sponsor})");
        var groups = ColumnGroupsOf(study);
        var laidOut = new List<(LaidOutTable Table, IReadOnlyList<string> Warnings)>();
        foreach (var table in package.Tables)
        {
            var result = TableAnalyses.For(table).Analyze(study, table, data);
            if (dataWarnings.Count > 0)
            {
                result = result with { Warnings = [.. dataWarnings, .. result.Warnings] };
            }
            foreach (var warning in result.Warnings)
            {
                log.Warning($"table {table.Id}: {warning}");
            }
            try
            {
                var built = TableLayoutBuilder.Build(result, studyLine, run, page, groups);
                var document = TableTemplates.Apply(templates, built.Document, TemplateValues.For(study, table, result, built.Document, run));
                laidOut.Add((built with { Document = document }, result.Warnings));
            }
            catch (ColumnGroupException e)
            {
                throw new SpecException(study.Source.Problem(e.Where, $"table {table.Id}: {e.Message}"));
            }
        }

        using var staging = new OutputStaging(request.OutputFolder);
        foreach (var (table, _) in laidOut)
        {
            foreach (var renderer in request.Renderers)
            {
                var name = OutputFileNames.ForTable(table.Document.TableId, renderer.Extension);
                using var buffer = new MemoryStream();
                renderer.Write(table.Document, buffer);
                var bytes = buffer.ToArray();
                if (PackageNormalizer.IsPackage(bytes))
                {
                    bytes = PackageNormalizer.Normalize(bytes, run.RunTime);
                }
                using var stream = staging.Create(name);
                stream.Write(bytes);
            }
        }
        if (request.Combined && laidOut.Count > 0)
        {
            CombinedOutputs.Write(staging, request.Renderers, laidOut.Select(t => t.Table).ToList(), run.RunTime);
        }
        using (var stream = staging.Create(ResultsFileName))
        {
            ResultsJsonWriter.Write(stream, study.Study.Id, run, laidOut);
        }
        var files = staging.Commit();
        foreach (var (table, _) in laidOut)
        {
            log.Info($"wrote table {table.Document.TableId}: {string.Join(", ", request.Renderers.Select(r => OutputFileNames.ForTable(table.Document.TableId, r.Extension)))}");
        }
        var warnings = laidOut.Sum(t => t.Warnings.Count);
        log.Info($"{laidOut.Count} table{(laidOut.Count == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}, {files.Count} files in {request.OutputFolder} ({clock.Elapsed.TotalSeconds:0.00} s)");
        return new RunSummary(files, laidOut.Count, warnings, clock.Elapsed);
    }

    /// <summary>The study's arm groups, keyed like the result columns (the arm value as a results key).</summary>
    private static IReadOnlyList<ColumnGroup> ColumnGroupsOf(StudySpec study) =>
        (study.Treatment.Groups ?? [])
            .Select((g, i) => new ColumnGroup(g.Label, g.Arms.Select(ResultKeys.FromLabel).ToList(), $"/treatment/groups/{i}"))
            .ToList();

    private static string DefaultDataFolder(StudySpec study)
    {
        if (study.Data.Folder is null)
        {
            throw new SpecException(study.Source.Problem("/data",
                "no data folder: give --data on the command line or data.folder in the study spec"));
        }
        return Path.GetFullPath(Path.Combine(study.Folder, study.Data.Folder));
    }

    private static PageSettings PageFrom(PageSpec? spec)
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
