namespace OutputForge.Data;

/// <summary>
/// The ADaM conventions the analyses rely on (CDISC ADaM Implementation Guide): one ADSL record
/// per USUBJID, every subject of a BDS or OCCDS dataset present in ADSL, and flag variables
/// (names ending in FL) holding only "Y", "N" or nothing.
/// </summary>
public static class AdamConformance
{
    public const string SubjectVariable = "USUBJID";

    public static void CheckSubjectLevel(Dataset adsl)
    {
        var subjects = adsl.Find(SubjectVariable)
            ?? throw new DataException(adsl.File, 1, null, $"ADSL has no {SubjectVariable} variable");
        if (adsl.RowCount == 0)
        {
            throw new DataException(adsl.File, null, null, "ADSL has a header but no subjects");
        }
        var firstLine = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var row = 0; row < adsl.RowCount; row++)
        {
            var id = subjects.GetText(row);
            if (id is null)
            {
                throw new DataException(adsl.File, adsl.LineOfRow[row], SubjectVariable, "USUBJID is missing");
            }
            if (!firstLine.TryAdd(id, adsl.LineOfRow[row]))
            {
                throw new DataException(adsl.File, adsl.LineOfRow[row], SubjectVariable,
                    $"subject {id} has a second ADSL row (first on line {firstLine[id]}); ADSL has one row per subject");
            }
        }
        CheckFlags(adsl);
    }

    public static void CheckAgainstSubjectLevel(Dataset dataset, Dataset adsl)
    {
        CheckFlags(dataset);
        var subjects = dataset.Find(SubjectVariable);
        if (subjects is null)
        {
            throw new DataException(dataset.File, 1, null, $"the dataset has no {SubjectVariable} variable, so its records cannot be linked to ADSL");
        }
        var known = new HashSet<string>(StringComparer.Ordinal);
        var adslSubjects = adsl.Get(SubjectVariable);
        for (var row = 0; row < adsl.RowCount; row++)
        {
            known.Add(adslSubjects.GetText(row)!);
        }
        for (var row = 0; row < dataset.RowCount; row++)
        {
            var id = subjects.GetText(row);
            if (id is null)
            {
                throw new DataException(dataset.File, dataset.LineOfRow[row], SubjectVariable, "USUBJID is missing");
            }
            if (!known.Contains(id))
            {
                throw new DataException(dataset.File, dataset.LineOfRow[row], SubjectVariable,
                    $"subject {id} is not in ADSL ({Path.GetFileName(adsl.File)})");
            }
        }
    }

    private static void CheckFlags(Dataset dataset)
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
                    throw new DataException(dataset.File, dataset.LineOfRow[row], column.Name,
                        $"flag value '{value}' (ADaM flags hold Y, N or nothing)");
                }
            }
        }
    }

    /// <summary>ADaM flag variables end in FL (e.g. ITTFL, ANL01FL, TRTEMFL, CRIT1FL).</summary>
    private static bool IsFlagName(string name) =>
        name.Length > 2 && name.EndsWith("FL", StringComparison.OrdinalIgnoreCase);
}
