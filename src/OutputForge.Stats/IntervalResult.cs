namespace OutputForge.Stats;

/// <summary>
/// A point estimate with a two-sided confidence interval, or the reason it cannot be estimated.
/// Never carries NaN: when <see cref="IsEstimable"/> is false, read <see cref="NotEstimableReason"/>.
/// </summary>
public sealed record IntervalResult(double Estimate, double Lower, double Upper, string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    public static IntervalResult NotEstimable(string reason) => new(0, 0, 0, reason);
}
