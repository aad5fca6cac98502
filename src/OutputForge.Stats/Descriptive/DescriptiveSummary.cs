namespace OutputForge.Stats.Descriptive;

/// <summary>
/// Descriptive statistics of one variable. A statistic that cannot be computed is null (never NaN)
/// and <see cref="Notes"/> says why (for example the SD of a single value, or the geometric mean of
/// data with non-positive values).
/// </summary>
public sealed record DescriptiveSummary(
    int N,
    double? Mean,
    double? StandardDeviation,
    double? Median,
    double? FirstQuartile,
    double? ThirdQuartile,
    double? Minimum,
    double? Maximum,
    double? GeometricMean,
    double? CoefficientOfVariationPercent)
{
    public IReadOnlyList<string> Notes { get; init; } = [];
}
