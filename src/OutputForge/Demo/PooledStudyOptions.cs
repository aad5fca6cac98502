namespace OutputForge.Demo;

/// <summary>
/// Enlarges the invented study to the size of a pooled analysis, for speed and memory measurements:
/// weekly assessments of further invented efficacy parameters in adeff.csv, more adverse events per
/// subject in adae.csv, and a spec set of <see cref="PooledSpecSet.TableCount"/> tables (specs/pooled).
/// The ordinary demo records are written first and unchanged; the extra records come from their own
/// seeded streams, so the same options still give byte-identical files.
/// </summary>
/// <param name="WeeklyParameters">How many of the <see cref="WeeklyEfficacyParameter.All"/> parameters to add
/// (each has a baseline and up to 12 weekly records per subject).</param>
/// <param name="ExtraEventsPerSubject">Mean number of further adverse events of a dosed subject over the full
/// 98-day participation (fewer for early dropouts).</param>
public sealed record PooledStudyOptions(int WeeklyParameters = 8, double ExtraEventsPerSubject = 9.8)
{
    /// <summary>Subjects of the pooled-analysis target study: 20,000.</summary>
    public const int TargetSubjects = 20_000;

    /// <summary>The target: with <see cref="TargetSubjects"/> subjects, about 2.1 million BDS records and 200,000 adverse events.</summary>
    public static PooledStudyOptions Target { get; } = new();
}
