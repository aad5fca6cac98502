using OutputForge.Analysis;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// The "observed" missing-data rule: each subject's record is taken as the dataset has it, including
/// records the dataset itself derived (e.g. imputed, marked by a non-blank DTYPE, as ADaM does) where the
/// endpoint's selection keeps them; subjects without a record are left out of the denominator.
/// </summary>
public static class ObservedCases
{
    public const string DerivationVariable = "DTYPE";

    /// <summary>Per arm key, the selected records with a non-blank DTYPE; null when the dataset has no DTYPE.</summary>
    public static IReadOnlyDictionary<string, int>? DerivedRecords(PopulationSelection selection, EndpointRecords records)
    {
        if (records.Dataset.Find(DerivationVariable) is not { } dtype)
        {
            return null;
        }
        var derived = selection.Arms.ToDictionary(a => a.Key, _ => 0);
        foreach (var (subject, arm) in selection.ArmOfSubject)
        {
            if (records.RowOfSubject.TryGetValue(subject, out var row) && dtype.GetText(row) is not null)
            {
                derived[arm.Key]++;
            }
        }
        return derived;
    }
}
