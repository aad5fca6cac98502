namespace OutputForge.Stats.Models;

/// <summary>
/// A one-way analysis of variance table: between- and within-group degrees of freedom, sums of
/// squares and mean squares, the F statistic and its p-value, R-squared and the residual SD; or why
/// it could not be computed.
/// </summary>
public sealed record AnovaResult(
    int BetweenDegreesOfFreedom,
    int WithinDegreesOfFreedom,
    double BetweenSumOfSquares,
    double WithinSumOfSquares,
    double BetweenMeanSquare,
    double WithinMeanSquare,
    double FStatistic,
    double PValue,
    double RSquared,
    double ResidualStandardDeviation,
    string? NotEstimableReason = null)
{
    public const string MethodName = "One-way analysis of variance";

    public bool IsEstimable => NotEstimableReason is null;

    public IReadOnlyList<string> Notes { get; init; } = [];

    public static AnovaResult NotEstimable(string reason) => new(0, 0, 0, 0, 0, 0, 0, 0, 0, 0, reason);
}
