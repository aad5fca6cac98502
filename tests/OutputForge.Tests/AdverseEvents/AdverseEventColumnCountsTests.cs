using OutputForge.Analysis;
using OutputForge.Kinds.AdverseEvents;
using OutputForge.Analysis.Summaries;

namespace OutputForge.Tests.AdverseEvents;

/// <summary>
/// The one-pass counts of a row in every column are the per-column counts, hand-countable here:
/// placebo S01 (events of ranks 0 and 2) and S02 (rank 1); active S05 (rank 0, twice) and S06
/// (severity missing, rank -1).
/// </summary>
public sealed class AdverseEventColumnCountsTests
{
    private static readonly TreatmentArm Placebo = new("Placebo", "Placebo", 0, true);
    private static readonly TreatmentArm Active = new("Active", "Active", 1, false);

    private static readonly AdverseEventRecord[] Records =
    [
        new("S01", Placebo, "Gastrointestinal", "Nausea", 0),
        new("S01", Placebo, "Gastrointestinal", "Nausea", 2),
        new("S02", Placebo, "Nervous system", "Headache", 1),
        new("S05", Active, "Gastrointestinal", "Nausea", 0),
        new("S05", Active, "Gastrointestinal", "Nausea", 0),
        new("S06", Active, "Nervous system", "Dizziness", -1),
    ];

    private static readonly SummaryColumn[] Columns =
    [
        new("placebo", "Placebo", 2, new HashSet<TreatmentArm> { Placebo }, false),
        new("active", "Active", 4, new HashSet<TreatmentArm> { Active }, false),
        new("total", "Total", 6, new HashSet<TreatmentArm> { Placebo, Active }, true),
    ];

    [Fact]
    public void Counts_every_column_as_the_per_column_counts_do()
    {
        var counts = AdverseEventCounts.OfColumns(Records, Columns, 3);
        foreach (var column in Columns)
        {
            var expected = AdverseEventCounts.Of(Records, column, 3);
            Assert.Equal(expected.Subjects, counts[column.Key].Subjects);
            Assert.Equal(expected.Events, counts[column.Key].Events);
            Assert.Equal(expected.SubjectsAtMaximumSeverity, counts[column.Key].SubjectsAtMaximumSeverity);
        }
        // By hand: placebo 2 subjects, 3 events, maxima 2 (S01) and 1 (S02); total 4 subjects, 6 events.
        Assert.Equal([0, 1, 1], counts["placebo"].SubjectsAtMaximumSeverity);
        Assert.Equal(4, counts["total"].Subjects);
        Assert.Equal(6, counts["total"].Events);
        Assert.Equal([1, 1, 1], counts["total"].SubjectsAtMaximumSeverity);
    }
}
