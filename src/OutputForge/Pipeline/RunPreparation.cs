using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Pipeline.Manifest;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Pipeline;

/// <summary>
/// The first part of a run, in the order its errors are reported: specs, templates, the data folder (kept apart from the
/// output folder), the selected tables, the datasets, the digests of every input and the run's facts.
/// </summary>
internal static class RunPreparation
{
    public static PreparedRun Prepare(RunRequest request, string lockedOutputFolder, RunClock clock, IRunLog log)
    {
        var package = SpecLoader.Load(request.SpecPath, request.AllowedFolders);
        var study = package.Study;
        var templates = TemplateSet.Load(study.Folder, package.Folders);
        log.Detail($"specs: {package.Tables.Count} table specs read in {clock.ElapsedMilliseconds:0} ms");
        var dataFolder = PackageInputs.DataFolder(package, request.DataFolder);
        OutputPlace.CheckApart(request.OutputFolder, lockedOutputFolder, dataFolder, study.Folder);
        // The selection is a command-line choice: a pattern that matches no table stops the run before any data is read.
        var selected = TableSelection.Select(package.Tables, request.Tables);
        var dataWarnings = new List<string>();
        clock.StartStep();
        // With --combined and --tables the kept tables are rebuilt too, so the run reads what every table uses.
        var projection = request.ReadEveryColumn ? null
            : RunColumns.For(study, request.Combined && request.Tables is not null ? package.Tables : selected);
        var data = StudyData.Load(study, dataFolder,
            request.DataOptions with { ReadableFolders = package.Folders.Folders, Projection = projection }, dataWarnings.Add);
        log.Detail($"data: {data.Datasets.Count} datasets, {data.Datasets.Sum(d => File.Exists(d.File) ? new FileInfo(d.File).Length : 0) / 1e6:0.0} MB read in {clock.StepMilliseconds:0} ms");
        foreach (var line in DataReadFacts.Describe(data, projection is not null))
        {
            log.Detail(line);
        }
        log.Info($"read {data.Datasets.Count} datasets from {dataFolder}: " +
                 string.Join(", ", data.Datasets.Select(d => $"{d.Name} ({d.RowCount} rows)")));

        clock.StartStep();
        var inputs = RunInputs.Read(package, data);
        log.Detail($"inputs: SHA-256 digests of the spec and data files in {clock.StepMilliseconds:0} ms");
        var facts = new RunFacts(request.RunTime ?? DateTimeOffset.UtcNow, ToolVersion.Text, inputs.SourceLineNames())
        {
            DataDigests = inputs.Data.Where(d => d.Dataset is not null)
                .ToDictionary(d => d.Dataset!, d => FileDigest.Short(d.Sha256), StringComparer.Ordinal),
        };
        return new PreparedRun(package, templates, dataFolder, data, dataWarnings, inputs, selected, facts);
    }
}
