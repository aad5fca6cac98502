namespace OutputForge.Stats.Proportions;

/// <summary>
/// A difference (arm minus control) compared with a margin, as data: what was tested, the null value of the difference
/// it was tested against (-margin or +margin by the direction for non-inferiority; +/-margin, 0 by default, for
/// superiority), the one-sided alpha, the estimate, the one-sided test, the two-sided 100(1 - 2 alpha)% interval (its
/// limit on the better side is the one-sided 100(1 - alpha)% bound), whether that interval excludes the null value,
/// and the conclusion (from the test). Notes say where the test and the interval disagree.
/// </summary>
public sealed record MarginComparison(
    MarginHypothesis Hypothesis,
    MarginDirection Direction,
    double Margin,
    double NullDifference,
    double Alpha,
    TestResult Test,
    IntervalResult Interval,
    bool IntervalExcludesNull,
    MarginConclusion Conclusion)
{
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>The difference of the null hypothesis for a margin (given as a non-negative number), a hypothesis and a direction.</summary>
    public static double NullValue(double margin, MarginHypothesis hypothesis, MarginDirection direction)
    {
        if (!(margin >= 0) || double.IsInfinity(margin))
        {
            throw new ArgumentOutOfRangeException(nameof(margin), margin, "The margin must be a finite number at least 0 (its side follows from the hypothesis and the direction).");
        }
        var better = direction == MarginDirection.HigherIsBetter ? 1 : -1;
        return hypothesis == MarginHypothesis.NonInferiority ? -better * margin : better * margin;
    }

    internal static void ValidateAlpha(double alpha)
    {
        if (!(alpha > 0 && alpha < 0.5))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "The one-sided alpha must lie strictly between 0 and 0.5.");
        }
    }

    /// <summary>Whether the interval lies wholly on the better side of the null value.</summary>
    internal static bool Excludes(IntervalResult interval, double nullDifference, MarginDirection direction) =>
        interval.IsEstimable && (direction == MarginDirection.HigherIsBetter ? interval.Lower > nullDifference : interval.Upper < nullDifference);
}
