namespace OutputForge.Results;

/// <summary>
/// One number of a table: its statistic name from the fixed vocabulary (see docs/results.md), the
/// raw value at full precision, and how to display it. A value that could not be estimated has
/// no number and says why. A value also knows the method that produced it, the confidence level of
/// an interval's bounds and the sidedness of a p-value or interval, as data (written to results.json).
/// </summary>
public sealed record StatisticValue(
    string Statistic,
    double? Value,
    ValueFormat Format,
    int Decimals = 0,
    string? NotEstimableReason = null,
    string? Method = null)
{
    /// <summary>The confidence level of an interval bound or of an estimate shown with its interval (0.95); null where none applies.</summary>
    public double? Level { get; init; }

    /// <summary>The tails a p-value or an interval covers; null where none applies.</summary>
    public Sidedness? Sided { get; init; }

    public static StatisticValue Count(string statistic, int value) => new(statistic, value, ValueFormat.Count);

    public static StatisticValue NotEstimable(string statistic, ValueFormat format, string reason, string? method = null) =>
        new(statistic, null, format, 0, reason, method);
}
