namespace OutputForge.Data;

/// <summary>
/// The ADaM conventions the analyses rely on (CDISC ADaM Implementation Guide): one ADSL record
/// per USUBJID, every subject of a BDS or OCCDS dataset present in ADSL, and flag variables
/// (names ending in FL) holding only "Y", "N" or nothing.
/// </summary>
public static class AdamConformance
{
    public const string SubjectVariable = "USUBJID";

    public static void CheckSubjectLevel(Dataset adsl) => ThrowFirst(SubjectLevelProblems(adsl));

    public static void CheckAgainstSubjectLevel(Dataset dataset, Dataset adsl) => ThrowFirst(ProblemsAgainstSubjectLevel(dataset, adsl));

    private static void ThrowFirst(IEnumerable<DataException> problems)
    {
        if (problems.FirstOrDefault() is { } first)
        {
            throw first;
        }
    }

    /// <summary>Every breach of the ADSL conventions, in file order (the run stops at the first; `check` lists them all).</summary>
    public static IEnumerable<DataException> SubjectLevelProblems(Dataset adsl)
    {
        var subjects = adsl.Find(SubjectVariable);
        if (subjects is null)
        {
            yield return new DataException(adsl.File, 1, null, $"ADSL has no {SubjectVariable} variable", DataProblemCode.NoSubjectLevelVariable);
            yield break;
        }
        if (adsl.RowCount == 0)
        {
            yield return new DataException(adsl.File, null, null, "ADSL has a header but no subjects", DataProblemCode.NoSubjects);
            yield break;
        }
        var firstLine = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var row = 0; row < adsl.RowCount; row++)
        {
            var id = subjects.GetText(row);
            if (id is null)
            {
                yield return new DataException(adsl.File, adsl.LineOfRow[row], SubjectVariable, "USUBJID is empty", DataProblemCode.EmptySubject);
            }
            else if (!firstLine.TryAdd(id, adsl.LineOfRow[row]))
            {
                yield return new DataException(adsl.File, adsl.LineOfRow[row], SubjectVariable,
                    $"subject {id} has a second ADSL row (first on line {firstLine[id]}); ADSL has one row per subject", DataProblemCode.RepeatedSubject);
            }
        }
        foreach (var problem in FlagProblems(adsl))
        {
            yield return problem;
        }
    }

    /// <summary>Every breach of the conventions linking a BDS or OCCDS dataset to ADSL, in file order.</summary>
    public static IEnumerable<DataException> ProblemsAgainstSubjectLevel(Dataset dataset, Dataset adsl)
    {
        foreach (var problem in FlagProblems(dataset))
        {
            yield return problem;
        }
        var subjects = dataset.Find(SubjectVariable);
        if (subjects is null)
        {
            yield return new DataException(dataset.File, 1, null, $"the dataset has no {SubjectVariable} variable, so its records cannot be linked to ADSL", DataProblemCode.NoSubjectVariable);
            yield break;
        }
        var known = new HashSet<string>(StringComparer.Ordinal);
        var adslSubjects = adsl.Find(SubjectVariable);
        for (var row = 0; adslSubjects is not null && row < adsl.RowCount; row++)
        {
            if (adslSubjects.GetText(row) is { } id)
            {
                known.Add(id);
            }
        }
        for (var row = 0; row < dataset.RowCount; row++)
        {
            var id = subjects.GetText(row);
            if (id is null)
            {
                yield return new DataException(dataset.File, dataset.LineOfRow[row], SubjectVariable, "USUBJID is empty", DataProblemCode.EmptySubject);
            }
            else if (!known.Contains(id))
            {
                yield return new DataException(dataset.File, dataset.LineOfRow[row], SubjectVariable,
                    $"subject {id} is not in ADSL ({Path.GetFileName(adsl.File)})", DataProblemCode.UnknownSubject);
            }
        }
    }

    private static IEnumerable<DataException> FlagProblems(Dataset dataset)
    {
        foreach (var column in dataset.Columns)
        {
            if (!IsFlagName(column.Name))
            {
                continue;
            }
            for (var row = 0; row < dataset.RowCount; row++)
            {
                var value = column.GetText(row);
                if (value is not null and not "Y" and not "N")
                {
                    yield return new DataException(dataset.File, dataset.LineOfRow[row], column.Name,
                        $"flag value '{value}' (ADaM flags hold Y, N or nothing)", DataProblemCode.Flag);
                }
            }
        }
    }

    /// <summary>ADaM flag variables end in FL (e.g. ITTFL, ANL01FL, TRTEMFL, CRIT1FL).</summary>
    private static bool IsFlagName(string name) =>
        name.Length > 2 && name.EndsWith("FL", StringComparison.OrdinalIgnoreCase);
}
