using OutputForge.Naming;

namespace OutputForge.Spec;

/// <summary>
/// Loads a study spec and its table specs and checks the references between them (populations,
/// datasets, unique table ids). Checks that need the data are made by the Analysis stage.
/// </summary>
public static class SpecLoader
{
    /// <summary>The file name looked for when --spec names a folder.</summary>
    public const string StudyFileName = "study.json";

    public static SpecPackage Load(string specPath) => Load(specPath, []);

    /// <summary>Loads the package; besides the study file's own folder tree, files may come from <paramref name="allowedFolders"/>.</summary>
    public static SpecPackage Load(string specPath, IReadOnlyList<string> allowedFolders)
    {
        var problems = new List<SpecProblem>();
        var package = LoadCollecting(specPath, problems, allowedFolders);
        if (problems.Count > 0)
        {
            throw new SpecException(problems);
        }
        return package!;
    }

    /// <summary>
    /// Reads what can be read and adds every problem to <paramref name="problems"/> instead of
    /// stopping: the study spec with the table specs that passed their schema, or null when the
    /// study file itself cannot be used. For `check`, which reports everything at once.
    /// </summary>
    public static SpecPackage? LoadCollecting(string specPath, List<SpecProblem> problems, IReadOnlyList<string>? allowedFolders = null)
    {
        string studyFile;
        StudySpec study;
        try
        {
            studyFile = ResolveStudyFile(specPath);
            study = SpecFileReader.Read<StudySpec>(studyFile, SpecSchemas.Study, (s, source) => s.Source = source);
        }
        catch (SpecException e)
        {
            problems.AddRange(e.Problems);
            return null;
        }
        var policy = new SpecFolderPolicy(Path.GetDirectoryName(Path.GetFullPath(studyFile))!, allowedFolders);
        var tables = new List<TableSpec>();
        var listed = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < study.Tables.Count; i++)
        {
            var relative = study.Tables[i];
            if (!listed.Add(Path.GetFullPath(Path.Combine(Path.GetDirectoryName(studyFile)!, relative))))
            {
                problems.Add(study.Source.Problem($"/tables/{i}", $"'{relative}' is listed twice"));
                continue;
            }
            var file = Path.Combine(Path.GetDirectoryName(studyFile)!, relative);
            if (!policy.Allows(file))
            {
                problems.Add(study.Source.Problem($"/tables/{i}", policy.Explain(relative)));
                continue;
            }
            if (!File.Exists(file))
            {
                problems.Add(study.Source.Problem($"/tables/{i}", $"no such table spec file '{relative}' (relative to {Path.GetFileName(studyFile)})"));
                continue;
            }
            try
            {
                tables.Add(SpecFileReader.Read<TableSpec>(DisplayPath(file), SpecSchemas.Table, (t, source) =>
                {
                    t.Source = source;
                    Kinds.TableKinds.ReadSettings(t, SpecFileReader.ModelOptions);
                }));
            }
            catch (SpecException e)
            {
                problems.AddRange(e.Problems);
            }
        }
        problems.AddRange(CheckStudy(study));
        problems.AddRange(CheckReferences(study, tables));
        return new SpecPackage(study, tables, policy);
    }

    /// <summary>A study file path: the file itself, or study.json inside a folder.</summary>
    public static string ResolveStudyFile(string specPath)
    {
        if (Directory.Exists(specPath))
        {
            var candidate = Path.Combine(specPath, StudyFileName);
            if (!File.Exists(candidate))
            {
                throw new SpecException(new SpecProblem(specPath, null, null, "$",
                    $"the folder has no {StudyFileName} (give the study spec file, or the folder that holds it)"));
            }
            return candidate;
        }
        if (!File.Exists(specPath))
        {
            throw new SpecException(new SpecProblem(specPath, null, null, "$", "no such spec file or folder"));
        }
        return specPath;
    }

    private static string DisplayPath(string file)
    {
        var relative = Path.GetRelativePath(Directory.GetCurrentDirectory(), file);
        return relative.StartsWith("..", StringComparison.Ordinal) ? Path.GetFullPath(file) : relative;
    }

    private static IEnumerable<SpecProblem> CheckStudy(StudySpec study)
    {
        if (!study.Data.Datasets.ContainsKey("adsl"))
        {
            yield return study.Source.Problem("/data/datasets", "the datasets must include 'adsl' (the subject-level dataset)");
        }
        foreach (var (name, population) in study.Populations)
        {
            if (population.Order is not null && population.Treatment is null)
            {
                yield return study.Source.Problem($"/populations/{name}/order", "'order' needs 'treatment' beside it");
            }
        }
        if (study.Treatment.Arms is { } arms)
        {
            for (var i = 0; i < arms.Count; i++)
            {
                if (arms.FindIndex(a => a.Value == arms[i].Value) < i)
                {
                    yield return study.Source.Problem($"/treatment/arms/{i}/value", $"arm '{arms[i].Value}' is listed twice");
                }
            }
            if (!arms.Exists(a => a.Value == study.Treatment.Control))
            {
                yield return study.Source.Problem("/treatment/control",
                    $"control arm '{study.Treatment.Control}' is not one of the arms listed{NearestName.Hint(study.Treatment.Control, arms.Select(a => a.Value).ToList())}");
            }
        }
    }

    private static IEnumerable<SpecProblem> CheckReferences(StudySpec study, List<TableSpec> tables)
    {
        var populations = study.Populations.Keys.ToList();
        var datasets = study.Data.Datasets.Keys.ToList();
        var ids = new Dictionary<string, TableSpec>(StringComparer.OrdinalIgnoreCase);
        foreach (var table in tables)
        {
            if (table.Id.Length > TableIds.MaxLength)
            {
                yield return table.Source.Problem("/id",
                    $"the table id is {table.Id.Length} characters long; at most {TableIds.MaxLength} fit, as it names the table's output files (table-<id>.docx, ...)");
            }
            if (ids.TryGetValue(table.Id, out var first))
            {
                yield return table.Source.Problem("/id", $"table id '{table.Id}' is already used by {first.Source.File}");
            }
            else
            {
                ids[table.Id] = table;
            }
            if (!study.Populations.ContainsKey(table.Population))
            {
                yield return table.Source.Problem(SpecProblemCode.UnknownReference, "/population",
                    $"unknown population '{table.Population}'{NearestName.Hint(table.Population, populations)}");
            }
            if (table.Endpoint is { } endpoint && !study.Data.Datasets.ContainsKey(endpoint.Dataset))
            {
                yield return table.Source.Problem(SpecProblemCode.UnknownReference, "/endpoint/dataset",
                    $"unknown dataset '{endpoint.Dataset}'{NearestName.Hint(endpoint.Dataset, datasets)}");
            }
        }
    }
}
