namespace OutputForge.Analysis.Summaries;

/// <summary>
/// A column of a summary table: one arm, or the Total of all arms. <paramref name="N"/> is the
/// column's number of subjects in the population, the denominator of its percentages.
/// </summary>
public sealed record SummaryColumn(string Key, string Label, int N, IReadOnlySet<TreatmentArm> Arms, bool IsTotal)
{
    public bool Holds(TreatmentArm arm) => Arms.Contains(arm);
}
