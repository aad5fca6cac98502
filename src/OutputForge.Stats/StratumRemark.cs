namespace OutputForge.Stats;

/// <summary>
/// A stratum that a stratified method left out, or that added nothing to it, as data: the stratum's index in the
/// caller's input (0-based) and why. The caller knows what the stratum is (its values) and words the remark; a
/// stratum that carries no information on the comparison must be named to the reader, not silently used.
/// </summary>
public sealed record StratumRemark(int Stratum, StratumRemarkReason Reason);

/// <summary>Why a stratum was left out of a stratified method or added nothing to it.</summary>
public enum StratumRemarkReason
{
    /// <summary>Only one of the groups compared has subjects in the stratum.</summary>
    OneGroupOnly,
    /// <summary>No subject of the stratum has the event.</summary>
    NoEvents,
}
