using OutputForge.Stats;

namespace OutputForge.Analysis;

/// <summary>The codes of Stats' stratum remarks as notes carry them (see <see cref="Results.NoteKind.StratumAddsNothing"/>).</summary>
public static class StratumReasons
{
    public const string OneGroupOnly = "one-group-only";
    public const string NoEvents = "no-events";

    public static string Code(StratumRemarkReason reason) => reason switch
    {
        StratumRemarkReason.OneGroupOnly => OneGroupOnly,
        StratumRemarkReason.NoEvents => NoEvents,
        _ => throw new ArgumentOutOfRangeException(nameof(reason), reason, "unknown stratum remark"),
    };
}
