namespace OutputForge.Stats;

/// <summary>The one-way analysis of variance table: sums of squares, degrees of freedom, mean squares, F and its p-value.</summary>
public sealed record OneWayAnovaResult(
    double SumOfSquaresBetween,
    double SumOfSquaresWithin,
    int DegreesOfFreedomBetween,
    int DegreesOfFreedomWithin,
    double MeanSquareBetween,
    double MeanSquareWithin,
    double F,
    double PValue,
    double RSquared,
    double ResidualStandardDeviation)
{
    /// <summary>
    /// The F test as a <see cref="TestResult"/>; its degrees of freedom are the numerator's
    /// (between groups), the denominator's being N minus the number of groups.
    /// </summary>
    public TestResult ToTest(IReadOnlyList<string> notes) =>
        new(OneWayAnova.MethodName, F, DegreesOfFreedomBetween, PValue) { Notes = notes };
}
