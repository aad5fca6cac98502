namespace OutputForge.Results;

/// <summary>
/// One number of a table: its statistic name from the fixed vocabulary (see docs/results.md), the
/// raw value at full precision, and how to display it. A value that could not be estimated has
/// no number and says why.
/// </summary>
public sealed record StatisticValue(
    string Statistic,
    double? Value,
    ValueFormat Format,
    int Decimals = 0,
    string? NotEstimableReason = null,
    string? Method = null)
{
    public static StatisticValue Count(string statistic, int value) => new(statistic, value, ValueFormat.Count);

    public static StatisticValue NotEstimable(string statistic, ValueFormat format, string reason, string? method = null) =>
        new(statistic, null, format, 0, reason, method);
}
