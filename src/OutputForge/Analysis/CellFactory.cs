using OutputForge.Results;
using OutputForge.Stats;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Analysis;

/// <summary>The result cells that many table kinds share: "n (%)", an interval, an estimate, a p-value.</summary>
public static class CellFactory
{
    /// <summary>n and its percentage of <paramref name="denominator"/>; no percentage when the denominator is 0.</summary>
    public static ResultCell CountPercent(string column, int n, int denominator, int percentDecimals)
    {
        var percent = denominator == 0
            ? StatisticValue.NotEstimable(Percent, ValueFormat.Percent, "no subjects in the denominator")
            : new StatisticValue(Percent, 100.0 * n / denominator, ValueFormat.Percent, percentDecimals);
        return new ResultCell(column, "{n} ({percent})",
            [StatisticValue.Count(SubjectCount, n), StatisticValue.Count(Denominator, denominator), percent]);
    }

    public static ResultCell Count(string column, int n) =>
        new(column, "{n}", [StatisticValue.Count(SubjectCount, n)]);

    /// <summary>An interval's bounds, multiplied by <paramref name="scale"/> (100 for percent), with their confidence level (two-sided) when given.</summary>
    public static ResultCell Interval(string column, IntervalResult interval, double scale, int decimals, string method, double? level = null)
    {
        var sided = level is null ? (Sidedness?)null : Sidedness.TwoSided;
        if (!interval.IsEstimable)
        {
            return new ResultCell(column, "{lower}",
                [StatisticValue.NotEstimable(Lower, ValueFormat.Decimal, interval.NotEstimableReason!, method) with { Level = level, Sided = sided }]);
        }
        return new ResultCell(column, "({lower}, {upper})",
        [
            new StatisticValue(Lower, interval.Lower * scale, ValueFormat.Decimal, decimals, Method: method) { Level = level, Sided = sided },
            new StatisticValue(Upper, interval.Upper * scale, ValueFormat.Decimal, decimals, Method: method) { Level = level, Sided = sided },
        ]);
    }

    /// <summary>An interval's point estimate, multiplied by <paramref name="scale"/>.</summary>
    public static ResultCell Estimate(string column, IntervalResult interval, double scale, int decimals, string method) =>
        interval.IsEstimable
            ? new ResultCell(column, "{estimate}",
                [new StatisticValue(StatisticNames.Estimate, interval.Estimate * scale, ValueFormat.Decimal, decimals, Method: method)])
            : new ResultCell(column, "{estimate}",
                [StatisticValue.NotEstimable(StatisticNames.Estimate, ValueFormat.Decimal, interval.NotEstimableReason!, method)]);

    /// <summary>A test's p-value, with its statistic and degrees of freedom kept in the results (not displayed).</summary>
    public static ResultCell PValueOf(string column, TestResult test)
    {
        if (!test.IsEstimable)
        {
            return new ResultCell(column, "{pValue}",
                [StatisticValue.NotEstimable(PValue, ValueFormat.PValue, test.NotEstimableReason!, test.Method) with { Sided = Sidedness.TwoSided }]);
        }
        // Every p-value of the tool is two-sided (docs/results.md).
        var values = new List<StatisticValue> { new(PValue, test.PValue, ValueFormat.PValue, Method: test.Method) { Sided = Sidedness.TwoSided } };
        if (test.Statistic is { } statistic)
        {
            values.Add(new StatisticValue(TestStatistic, statistic, ValueFormat.Decimal, 3, Method: test.Method));
        }
        if (test.DegreesOfFreedom is { } df)
        {
            values.Add(new StatisticValue(DegreesOfFreedom, df, ValueFormat.Decimal, 0, Method: test.Method));
        }
        return new ResultCell(column, "{pValue}", values);
    }

    public static ResultCell Empty(string column) => new(column, string.Empty, []);
}
