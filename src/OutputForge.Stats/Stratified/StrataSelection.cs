namespace OutputForge.Stats.Stratified;

/// <summary>
/// Validation of 2 x 2 x K strata and the choice of the strata that can contribute: a stratum with
/// no subjects, or with no subjects in one of the groups, carries no information on the comparison
/// and is skipped; each skipped stratum is returned as a <see cref="StratumRemark"/> (by its index, for the caller to name).
/// </summary>
internal static class StrataSelection
{
    public static (List<StratumCounts> Used, List<StratumRemark> Remarks) Select(IReadOnlyList<StratumCounts> strata)
    {
        ArgumentNullException.ThrowIfNull(strata);
        var used = new List<StratumCounts>();
        var remarks = new List<StratumRemark>();
        for (int k = 0; k < strata.Count; k++)
        {
            var s = strata[k] ?? throw new ArgumentException($"Stratum {k + 1} is null.", nameof(strata));
            TwoGroupCounts.Validate(s.Events1, s.Total1, s.Events2, s.Total2);
            if (s.N == 0)
            {
                remarks.Add(new StratumRemark(k, StratumRemarkReason.NoSubjects));
            }
            else if (s.Total1 == 0 || s.Total2 == 0)
            {
                remarks.Add(new StratumRemark(k, StratumRemarkReason.EmptyGroup, Group: s.Total1 == 0 ? 1 : 2));
            }
            else
            {
                used.Add(s);
            }
        }
        return (used, remarks);
    }
}
