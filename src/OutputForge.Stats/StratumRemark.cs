namespace OutputForge.Stats;

/// <summary>
/// A stratum that a stratified method left out, or that added nothing to it, as data: the stratum's index in the
/// caller's input (0-based) and why. The caller knows what the stratum is (its values) and words the remark; a
/// stratum that carries no information on the comparison must be named to the reader, not silently used.
/// </summary>
/// <param name="Stratum">The stratum's index in the caller's input, from 0.</param>
/// <param name="Reason">Why the stratum was left out or added nothing.</param>
/// <param name="Method">The method that left the stratum out when only that one does (the Breslow-Day test leaves out
/// strata without variability, which the common estimates keep); null when every method on these strata leaves it out,
/// so that the same remark from several methods on one set of strata is one remark.</param>
/// <param name="Group">For <see cref="StratumRemarkReason.EmptyGroup"/>: the group without subjects (1 or 2).</param>
public sealed record StratumRemark(int Stratum, StratumRemarkReason Reason, string? Method = null, int? Group = null);

/// <summary>Why a stratum was left out of a stratified method or added nothing to it.</summary>
public enum StratumRemarkReason
{
    /// <summary>Only one of the groups compared has subjects in the stratum.</summary>
    OneGroupOnly,
    /// <summary>No subject of the stratum has the event.</summary>
    NoEvents,
    /// <summary>Every subject of the stratum has the event.</summary>
    AllEvents,
    /// <summary>The stratum has no subjects.</summary>
    NoSubjects,
    /// <summary>The stratum has a single subject, so no variance.</summary>
    SingleSubject,
    /// <summary>One of two groups (<see cref="StratumRemark.Group"/>) has no subjects in the stratum.</summary>
    EmptyGroup,
}
