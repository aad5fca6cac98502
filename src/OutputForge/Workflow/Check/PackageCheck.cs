using OutputForge.Data;
using OutputForge.Spec;

namespace OutputForge.Workflow.Check;

/// <summary>
/// `check`: reads a study's specs and data as a run would, but collects every problem instead of
/// stopping at the first, and makes the further ADaM and spec-against-data checks, producing no table.
/// </summary>
public static class PackageCheck
{
    public static CheckReport Run(string specPath, string? dataFolder)
    {
        var report = new CheckReport();
        var specProblems = new List<SpecProblem>();
        var package = SpecLoader.LoadCollecting(specPath, specProblems);
        foreach (var problem in specProblems)
        {
            report.Add(CheckProblem.FromSpec(problem));
        }
        if (package is null)
        {
            return report;
        }
        var study = package.Study;
        var folder = dataFolder ?? (study.Data.Folder is null ? null : Path.GetFullPath(Path.Combine(study.Folder, study.Data.Folder)));
        if (folder is null)
        {
            report.Add(CheckProblem.FromSpec(study.Source.Problem("/data", "no data folder: give --data on the command line or data.folder in the study spec")));
            return report;
        }
        if (dataFolder is null && !package.Folders.Allows(folder))
        {
            report.Add(CheckProblem.FromSpec(study.Source.Problem("/data/folder", package.Folders.Explain(study.Data.Folder!) + ", or give --data")));
            return report;
        }
        if (!Directory.Exists(folder))
        {
            report.Add(new CheckProblem(CheckSeverity.Error, folder, "", "no such data folder", "give --data the folder with the CSV files"));
            return report;
        }
        var datasets = ReadDatasets(study, folder, package.Folders.Folders, report);
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
            report.Add(new CheckProblem(CheckSeverity.Warning, study.Source.File, "",
                "the tables' own checks (endpoint values, record selection) were not made because of the data errors above",
                "fix the errors above and run check again"));
        }
        SpecDataChecks.Run(package, datasets, complete ? StudyData.Load(study, folder) : null, report);
        return report;
    }

    private static string Kind(DataException problem) => $"{problem.Variable ?? "file"}: {problem.Code}";

    private static Dictionary<string, Dataset> ReadDatasets(StudySpec study, string folder, IReadOnlyList<string> allowedFolders, CheckReport report)
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
                DatasetFileScope.Check(path, folder, allowedFolders);
                // Every column of every format: check holds the whole file to the ADaM conventions, not only what tables use.
                datasets[name] = DatasetFiles.Read(name, path, DataReadOptions.Default, _ => { }, study.Data.Members.GetValueOrDefault(name));
            }
            catch (DataException e)
            {
                report.Add(CheckProblem.FromData(e, CheckHints.DataFile));
            }
        }
        return datasets;
    }
}
