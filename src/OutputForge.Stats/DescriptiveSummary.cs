namespace OutputForge.Stats;

/// <summary>
/// The descriptive statistics of one sample. Statistics that need more observations than the
/// sample has are null (the mean and quartiles of an empty sample, the SD of a single value).
/// </summary>
public sealed record DescriptiveSummary(
    int N,
    double? Mean,
    double? StandardDeviation,
    double? Median,
    double? FirstQuartile,
    double? ThirdQuartile,
    double? Minimum,
    double? Maximum);
