namespace OutputForge.Stats;

/// <summary>
/// The outcome of a hypothesis test: its name as printed in a footnote, the statistic (where the
/// test has one), degrees of freedom (where it has them) and the p-value; or why it could not be run.
/// </summary>
public sealed record TestResult(
    string Method,
    double? Statistic,
    double? DegreesOfFreedom,
    double PValue,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    /// <summary>
    /// Warnings that must travel with the result (rows or columns dropped for a zero total, strata
    /// skipped, small expected counts). Empty when there is nothing to say.
    /// </summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>The strata a stratified method left out or that added nothing to it, by index and reason (the caller names them).</summary>
    public IReadOnlyList<StratumRemark> StratumRemarks { get; init; } = [];

    public static TestResult NotEstimable(string method, string reason) => new(method, null, null, 0, reason);
}
