using System.Globalization;
using OutputForge.Data;
using OutputForge.Results;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// Decimals of each descriptive statistic. The rule of the trade (common practice): mean, median and
/// quartiles one decimal more than the data, SD two more, min and max as collected; the geometric mean
/// as the mean, CV% with one decimal. The data's
/// decimals are the spec's, or the most found among the values as written. A statistic's own
/// setting in the spec (variable first, then table) overrides the rule.
/// </summary>
public static class StatisticDecimals
{
    /// <summary>More data decimals than this is taken as a derived value written at full precision, and capped (with a warning).</summary>
    public const int DetectionCap = 4;

    public static int DetectData(DataColumn column, IEnumerable<int> rows) =>
        rows.Select(column.GetText).OfType<string>().Select(DecimalsOf).DefaultIfEmpty(0).Max();

    private static int DecimalsOf(string text)
    {
        var trimmed = text.Trim();
        var exponent = trimmed.IndexOfAny(['e', 'E']);
        if (exponent >= 0)
        {
            // "1.5E-3": decimals of the mantissa minus the exponent.
            var mantissa = DecimalsOf(trimmed[..exponent]);
            var power = int.Parse(trimmed[(exponent + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
            return Math.Max(0, mantissa - power);
        }
        var dot = trimmed.IndexOf('.');
        return dot < 0 ? 0 : trimmed.Length - dot - 1;
    }

    public static int For(string statistic, int dataDecimals, StatisticDecimalsSpec? variable, StatisticDecimalsSpec? table)
    {
        int? Pick(Func<StatisticDecimalsSpec, int?> field) =>
            (variable is null ? null : field(variable)) ?? (table is null ? null : field(table));
        return statistic switch
        {
            StatisticNames.Mean => Pick(s => s.Mean) ?? dataDecimals + 1,
            StatisticNames.StandardDeviation => Pick(s => s.Sd) ?? dataDecimals + 2,
            StatisticNames.Median => Pick(s => s.Median) ?? dataDecimals + 1,
            StatisticNames.FirstQuartile => Pick(s => s.Q1) ?? dataDecimals + 1,
            StatisticNames.ThirdQuartile => Pick(s => s.Q3) ?? dataDecimals + 1,
            StatisticNames.Minimum => Pick(s => s.Min) ?? dataDecimals,
            StatisticNames.Maximum => Pick(s => s.Max) ?? dataDecimals,
            StatisticNames.GeometricMean => Pick(s => s.GeometricMean) ?? dataDecimals + 1,
            StatisticNames.CoefficientOfVariation => Pick(s => s.Cv) ?? 1,
            _ => 0,
        };
    }
}
