namespace OutputForge.Stats.Stratified;

/// <summary>
/// Validation of 2 x 2 x K strata and the choice of the strata that can contribute: a stratum with
/// no subjects, or with no subjects in one of the groups, carries no information on the comparison
/// and is skipped; each skipped stratum is named (numbered from 1) in the returned notes.
/// </summary>
internal static class StrataSelection
{
    public static (List<StratumCounts> Used, List<string> Notes) Select(IReadOnlyList<StratumCounts> strata)
    {
        ArgumentNullException.ThrowIfNull(strata);
        var used = new List<StratumCounts>();
        var notes = new List<string>();
        for (int k = 0; k < strata.Count; k++)
        {
            var s = strata[k] ?? throw new ArgumentException($"Stratum {k + 1} is null.", nameof(strata));
            TwoGroupCounts.Validate(s.Events1, s.Total1, s.Events2, s.Total2);
            if (s.N == 0)
            {
                notes.Add($"Stratum {k + 1} has no subjects and was skipped.");
            }
            else if (s.Total1 == 0 || s.Total2 == 0)
            {
                notes.Add($"Stratum {k + 1} has no subjects in group {(s.Total1 == 0 ? 1 : 2)} and was skipped.");
            }
            else
            {
                used.Add(s);
            }
        }
        return (used, notes);
    }
}
