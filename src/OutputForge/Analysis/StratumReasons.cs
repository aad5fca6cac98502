using OutputForge.Stats;

namespace OutputForge.Analysis;

/// <summary>
/// The codes of Stats' stratum remarks as notes carry them (<see cref="Results.NoteKind.StratumAddsNothing"/>,
/// <see cref="Results.NoteKind.StratumLeftOut"/>); Layout's wording reads the same codes.
/// </summary>
public static class StratumReasons
{
    public const string OneGroupOnly = "one-group-only";
    public const string NoEvents = "no-events";
    public const string AllEvents = "all-events";
    public const string NoSubjects = "no-subjects";
    public const string SingleSubject = "single-subject";
    public const string EmptyGroup = "empty-group";

    public static string Code(StratumRemarkReason reason) => reason switch
    {
        StratumRemarkReason.OneGroupOnly => OneGroupOnly,
        StratumRemarkReason.NoEvents => NoEvents,
        StratumRemarkReason.AllEvents => AllEvents,
        StratumRemarkReason.NoSubjects => NoSubjects,
        StratumRemarkReason.SingleSubject => SingleSubject,
        StratumRemarkReason.EmptyGroup => EmptyGroup,
        _ => throw new ArgumentOutOfRangeException(nameof(reason), reason, "unknown stratum remark"),
    };
}
