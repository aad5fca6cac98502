using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;
using QuantileDefinition = MathNet.Numerics.Statistics.QuantileDefinition;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// The rows of one continuous variable: per column, the statistics each row lays out, with the
/// decimals of <see cref="StatisticDecimals"/>. Row keys (<see cref="ResultKey"/>): "{variable}/{row as written in the spec}" ("age/mean-sd").
/// Also gives the values per arm, for the analysis of variance.
/// </summary>
public static class ContinuousSummary
{
    public static (List<ResultRow> Rows, List<IReadOnlyList<double>> ArmValues, List<string> Warnings) Summarize(
        DemographicVariableSpec spec, DemographicsSettings settings, DataColumn column, IReadOnlyList<(int Row, TreatmentArm Arm)> subjects,
        IReadOnlyList<TreatmentArm> arms, IReadOnlyList<SummaryColumn> columns, SpecSource source, string pointer)
    {
        var warnings = new List<string>();
        var layouts = (spec.Rows ?? StatisticRowLayout.DefaultRows)
            .Select((text, i) => StatisticRowLayout.Parse(text, source, spec.Rows is null ? pointer : $"{pointer}/rows/{i}"))
            .ToList();
        var dataDecimals = spec.DataDecimals ?? StatisticDecimals.DetectData(column, subjects.Select(s => s.Row));
        if (spec.DataDecimals is null && dataDecimals > StatisticDecimals.DetectionCap)
        {
            warnings.Add($"{column.Name} is written with up to {dataDecimals} decimals; {StatisticDecimals.DetectionCap} are assumed (set \"dataDecimals\" to say how it was collected).");
            dataDecimals = StatisticDecimals.DetectionCap;
        }
        // Hyndman and Fan (1996) definition 2, the usual one in clinical summaries (common practice); 7 is R's.
        var quantiles = settings.Quartiles;
        var geometricMean = layouts.Any(l => l.Statistics.Contains(GeometricMean));
        var summaries = columns.ToDictionary(c => c.Key, c => Summarize(
            subjects.Where(s => c.Holds(s.Arm) && !double.IsNaN(column.GetNumber(s.Row))).Select(s => column.GetNumber(s.Row)).ToList(),
            quantiles, geometricMean));

        var rows = new List<ResultRow>();
        foreach (var layout in layouts)
        {
            rows.Add(new ResultRow(ResultKey.Of(spec.Variable, layout.Text), layout.Label, 1, columns.Select(c => new ResultCell(c.Key, layout.Pattern,
                layout.Statistics.Select(name => Value(name, summaries[c.Key], StatisticDecimals.For(name, dataDecimals, spec.Decimals, settings.Decimals))).ToList())).ToList()));
        }
        if (spec.Missing)
        {
            rows.Add(new ResultRow(ResultKey.Of(spec.Variable, ResultKey.Missing), "Missing", 1, columns.Select(c => CellFactory.Count(c.Key,
                subjects.Count(s => c.Holds(s.Arm) && double.IsNaN(column.GetNumber(s.Row))))).ToList()));
        }
        var armValues = arms.Select(a => (IReadOnlyList<double>)subjects
            .Where(s => s.Arm == a && !double.IsNaN(column.GetNumber(s.Row))).Select(s => column.GetNumber(s.Row)).ToList()).ToList();
        return (rows, armValues, warnings);
    }

    /// <summary>
    /// The descriptive statistics, with the median and quartiles taken on exact decimals, so that one
    /// lying on a rounding midpoint (0.65 from 0.6 and 0.7) displays as it should.
    /// </summary>
    /// <param name="geometricMean">Whether a row shows the geometric mean (it costs a logarithm and an exact mean per value).</param>
    private static DescriptiveSummary Summarize(List<double> values, QuantileDefinition quantiles, bool geometricMean)
    {
        var summary = DescriptiveStatistics.Compute(values, quantiles, geometricMean);
        if (values.Count == 0)
        {
            return summary;
        }
        var (median, firstQuartile, thirdQuartile) = ExactQuantiles.Quartiles(values, quantiles);
        return summary with { Median = median, FirstQuartile = firstQuartile, ThirdQuartile = thirdQuartile };
    }

    private static StatisticValue Value(string name, DescriptiveSummary summary, int decimals)
    {
        if (name == SubjectCount)
        {
            return StatisticValue.Count(SubjectCount, summary.N);
        }
        double? value = name switch
        {
            Mean => summary.Mean,
            StandardDeviation => summary.StandardDeviation,
            Median => summary.Median,
            FirstQuartile => summary.FirstQuartile,
            ThirdQuartile => summary.ThirdQuartile,
            Minimum => summary.Minimum,
            Maximum => summary.Maximum,
            GeometricMean => summary.GeometricMean,
            CoefficientOfVariation => summary.CoefficientOfVariationPercent,
            _ => null,
        };
        if (value is { } number)
        {
            return new StatisticValue(name, number, ValueFormat.Decimal, decimals);
        }
        var reason = summary.N == 0 ? "no values"
            : name == GeometricMean ? "the geometric mean needs positive values"
            : name == CoefficientOfVariation && summary.N > 1 ? "the coefficient of variation needs a non-zero mean"
            : "a single value has no standard deviation";
        return StatisticValue.NotEstimable(name, ValueFormat.Decimal, reason);
    }
}
