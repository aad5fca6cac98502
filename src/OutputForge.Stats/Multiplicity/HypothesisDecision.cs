namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// One hypothesis after a multiplicity adjustment: its position in the caller's list (0-based), raw and adjusted
/// p-value, whether it is rejected at the familywise level, and when rejected its place in the order of rejection
/// (1 for the first rejected).
/// </summary>
public sealed record HypothesisDecision(int Index, double RawP, double AdjustedP, bool Rejected, int? RejectionOrder);
