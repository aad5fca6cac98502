using OutputForge.Analysis.Summaries;

namespace OutputForge.Analysis.AdverseEvents;

/// <summary>
/// The counts of one row (any event, a class, or a term) in one column: subjects with at least one
/// event (each counted once, whatever the number of events), the number of events, and subjects by
/// their maximum severity among the row's events.
/// </summary>
public sealed record AdverseEventCounts(int Subjects, int Events, IReadOnlyList<int> SubjectsAtMaximumSeverity)
{
    public static AdverseEventCounts Of(IEnumerable<AdverseEventRecord> records, SummaryColumn column, int severityLevels)
    {
        var inColumn = records.Where(r => column.Holds(r.Arm)).ToList();
        var maximum = inColumn.GroupBy(r => r.Subject, StringComparer.Ordinal).Select(g => g.Max(r => r.SeverityRank)).ToList();
        var levels = Math.Max(1, severityLevels);
        return new AdverseEventCounts(
            maximum.Count,
            inColumn.Count,
            Enumerable.Range(0, levels).Select(level => maximum.Count(m => m == level)).ToList());
    }
}
