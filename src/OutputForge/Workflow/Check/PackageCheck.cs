using OutputForge.Data;
using OutputForge.Pipeline;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Workflow.Check;

/// <summary>
/// `check`: reads a study's specs and data as a run would, but collects every problem instead of
/// stopping at the first, and makes the further ADaM and spec-against-data checks, producing no table.
/// The inputs are resolved as a run resolves them (<see cref="PackageInputs"/>, the same options), so a
/// package that check passes is not refused by run.
/// </summary>
internal static class PackageCheck
{
    public static CheckReport Run(string specPath, string? dataFolder) => Run(specPath, dataFolder, PackageInputOptions.Default);

    /// <exception cref="Pipeline.TableSelectionException">A --tables pattern matches no table (a usage error, as in a run).</exception>
    public static CheckReport Run(string specPath, string? dataFolder, PackageInputOptions options)
    {
        var report = new CheckReport();
        var specProblems = new List<SpecProblem>();
        var package = SpecLoader.LoadCollecting(specPath, specProblems, options.AllowedFolders);
        foreach (var problem in specProblems)
        {
            report.Add(CheckProblem.FromSpec(problem));
        }
        if (package is null)
        {
            return report;
        }
        var study = package.Study;
        package = package with { Tables = TableSelection.Select(package.Tables, options.Tables) };
        try
        {
            TemplateSet.Load(study.Folder, package.Folders);
        }
        catch (TemplateException e)
        {
            report.Add(new CheckProblem(CheckSeverity.Error, study.Source.File, "", e.Message, "correct the template beside the study spec"));
        }
        var specErrors = report.Errors;
        if (PackageInputs.TryDataFolder(package, dataFolder, out var resolved) is { } folderProblem)
        {
            report.Add(CheckProblem.FromSpec(folderProblem));
            return report;
        }
        var folder = resolved!;
        if (!Directory.Exists(folder))
        {
            report.Add(new CheckProblem(CheckSeverity.Error, folder, "", "no such data folder", "give --data the folder with the CSV files"));
            return report;
        }
        var readOptions = options.DataOptions with { ReadableFolders = package.Folders.Folders };
        var datasets = ReadDatasets(study, folder, readOptions, report);
        if (!datasets.TryGetValue("adsl", out var adsl))
        {
            return report;
        }
        foreach (var problem in AdamConformance.SubjectLevelProblems(adsl))
        {
            report.Add(CheckProblem.FromData(problem, CheckHints.ForData(problem)), Kind(problem));
        }
        foreach (var dataset in datasets.Values.Where(d => d.Name != "adsl"))
        {
            foreach (var problem in AdamConformance.ProblemsAgainstSubjectLevel(dataset, adsl))
            {
                report.Add(CheckProblem.FromData(problem, CheckHints.ForData(problem)), Kind(problem));
            }
        }
        foreach (var dataset in datasets.Values)
        {
            AdamConventionChecks.Run(dataset, report);
        }
        var complete = report.Errors == 0 && datasets.Count == study.Data.Datasets.Count;
        if (!complete)
        {
            var dataErrors = report.Errors - specErrors > 0 || datasets.Count < study.Data.Datasets.Count;
            var which = (specErrors > 0, dataErrors) switch
            {
                (true, true) => "spec and data errors",
                (true, false) => "spec errors",
                _ => "data errors",
            };
            report.Add(new CheckProblem(CheckSeverity.Warning, study.Source.File, "",
                $"the tables' own checks (endpoint values, record selection) were not made because of the {which} above",
                "fix the errors above and run check again"));
        }
        SpecDataChecks.Run(package, datasets, complete ? StudyData.Load(study, folder, readOptions, _ => { }) : null, report);
        return report;
    }

    private static string Kind(DataException problem) => $"{problem.Variable ?? "file"}: {problem.Code}";

    private static Dictionary<string, Dataset> ReadDatasets(StudySpec study, string folder, DataReadOptions options, CheckReport report)
    {
        var datasets = new Dictionary<string, Dataset>(StringComparer.Ordinal);
        foreach (var (name, fileName) in study.Data.Datasets.OrderBy(d => d.Key == "adsl" ? 0 : 1).ThenBy(d => d.Key, StringComparer.Ordinal))
        {
            var path = Path.Combine(folder, fileName);
            if (!File.Exists(path))
            {
                report.Add(CheckProblem.FromSpec(study.Source.Problem($"/data/datasets/{name}",
                    $"no file {fileName} in {folder} (dataset '{name}')")) with { Hint = "give --data the right folder, or correct the file name" });
                continue;
            }
            try
            {
                DatasetFileScope.Check(path, folder, options.ReadableFolders);
                // Every column of every format: check holds the whole file to the ADaM conventions, not only what tables use.
                datasets[name] = DatasetFiles.Read(name, path, options, warning => report.Add(new CheckProblem(CheckSeverity.Warning, path, "",
                    warning, "a run would print this warning in every table's footnotes; check that it is expected")), study.Data.Members.GetValueOrDefault(name));
            }
            catch (DataException e)
            {
                report.Add(CheckProblem.FromData(e, CheckHints.DataFile));
            }
        }
        return datasets;
    }
}
