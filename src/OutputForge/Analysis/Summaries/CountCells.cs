using OutputForge.Results;
using OutputForge.Spec;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Analysis.Summaries;

/// <summary>"n (%)" cells as the table's percent settings ask: with or without a percent sign, with an optional event count "[E]".</summary>
public static class CountCells
{
    public static ResultCell CountPercent(string column, int n, int denominator, PercentDisplaySpec percent, int? events = null)
    {
        var pattern = percent.Sign ? "{n} ({percent}%)" : "{n} ({percent})";
        var values = new List<StatisticValue>
        {
            StatisticValue.Count(SubjectCount, n),
            StatisticValue.Count(Denominator, denominator),
            denominator == 0
                ? StatisticValue.NotEstimable(Percent, ValueFormat.Percent, "no subjects in the denominator")
                : new StatisticValue(Percent, 100.0 * n / denominator, ValueFormat.Percent, percent.Decimals),
        };
        if (events is { } e)
        {
            pattern += " [{events}]";
            values.Add(StatisticValue.Count(EventCount, e));
        }
        return new ResultCell(column, pattern, values);
    }
}
