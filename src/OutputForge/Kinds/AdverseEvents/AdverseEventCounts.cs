using System.Runtime.InteropServices;
using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;

namespace OutputForge.Kinds.AdverseEvents;

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

    /// <summary>
    /// The counts of one row in every column, keyed by column, from one pass over the row's records: the
    /// same counts as <see cref="Of"/> per column, since a subject's records all carry the subject's arm.
    /// </summary>
    public static Dictionary<string, AdverseEventCounts> OfColumns(IEnumerable<AdverseEventRecord> records, IReadOnlyList<SummaryColumn> columns, int severityLevels)
    {
        var maximumOfSubject = new Dictionary<string, (TreatmentArm Arm, int Rank)>(StringComparer.Ordinal);
        var eventsOfArm = new Dictionary<TreatmentArm, int>();
        foreach (var record in records)
        {
            ref var events = ref CollectionsMarshal.GetValueRefOrAddDefault(eventsOfArm, record.Arm, out _);
            events++;
            ref var maximum = ref CollectionsMarshal.GetValueRefOrAddDefault(maximumOfSubject, record.Subject, out var seen);
            maximum = seen ? (maximum.Arm, Math.Max(maximum.Rank, record.SeverityRank)) : (record.Arm, record.SeverityRank);
        }
        var levels = Math.Max(1, severityLevels);
        var counts = new Dictionary<string, AdverseEventCounts>();
        foreach (var column in columns)
        {
            var subjects = 0;
            var atLevel = new int[levels];
            foreach (var (arm, rank) in maximumOfSubject.Values)
            {
                if (!column.Holds(arm)) continue;
                subjects++;
                if (rank >= 0 && rank < levels) atLevel[rank]++;
            }
            var eventCount = eventsOfArm.Where(p => column.Holds(p.Key)).Sum(p => p.Value);
            counts.Add(column.Key, new AdverseEventCounts(subjects, eventCount, atLevel.ToList()));
        }
        return counts;
    }
}
