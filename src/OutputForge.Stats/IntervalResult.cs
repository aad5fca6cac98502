namespace OutputForge.Stats;

/// <summary>
/// A point estimate with a two-sided confidence interval, or the reason it cannot be estimated.
/// Never carries NaN: when <see cref="IsEstimable"/> is false, read <see cref="NotEstimableReason"/>.
/// </summary>
public sealed record IntervalResult(double Estimate, double Lower, double Upper, string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    /// <summary>
    /// Remarks a reader of the table must see beside the number, for example that a bound was
    /// truncated to the parameter space. Empty when there is nothing to say.
    /// </summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>The strata a stratified method left out or that added nothing to it, by index and reason (the caller names them).</summary>
    public IReadOnlyList<StratumRemark> StratumRemarks { get; init; } = [];

    public static IntervalResult NotEstimable(string reason) => new(0, 0, 0, reason);
}
