using OutputForge.Kinds.Responders;
using OutputForge.Results;
using OutputForge.Stats;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Kinds.Subgroups;

/// <summary>The cells of a subgroup table: responders n/N (%) of an arm, and an effect with its interval.</summary>
internal static class SubgroupCells
{
    /// <summary>"n/N (pct)"; "0/0" without a percentage when the level has no subjects of the arm.</summary>
    public static ResultCell Responders(string column, ResponderCounts counts, int percentDecimals)
    {
        var n = StatisticValue.Count(SubjectCount, counts.Responders);
        var denominator = StatisticValue.Count(Denominator, counts.Denominator);
        return counts.Denominator == 0
            ? new ResultCell(column, "{n}/{N}", [n, denominator])
            : new ResultCell(column, "{n}/{N} ({percent})",
                [n, denominator, new StatisticValue(Percent, 100.0 * counts.Responders / counts.Denominator, ValueFormat.Percent, percentDecimals)]);
    }

    /// <summary>"estimate (lower, upper)" on the measure's scale, or NE with the reason.</summary>
    public static ResultCell Effect(string column, IntervalResult effect, SubgroupMeasure measure)
    {
        if (!effect.IsEstimable)
        {
            return new ResultCell(column, "{estimate}",
                [StatisticValue.NotEstimable(Estimate, ValueFormat.Decimal, effect.NotEstimableReason!, measure.Method)]);
        }
        return new ResultCell(column, "{estimate} ({lower}, {upper})",
        [
            new StatisticValue(Estimate, effect.Estimate * measure.Scale, ValueFormat.Decimal, measure.Decimals, Method: measure.Method),
            new StatisticValue(Lower, effect.Lower * measure.Scale, ValueFormat.Decimal, measure.Decimals, Method: measure.Method) { Level = measure.Level, Sided = Sidedness.TwoSided },
            new StatisticValue(Upper, effect.Upper * measure.Scale, ValueFormat.Decimal, measure.Decimals, Method: measure.Method) { Level = measure.Level, Sided = Sidedness.TwoSided },
        ]);
    }
}
