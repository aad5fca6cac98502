namespace OutputForge.Results;

/// <summary>The fixed vocabulary of the "statistic" field of results.json (documented in docs/results.md).</summary>
public static class StatisticNames
{
    public const string SubjectCount = "n";
    public const string Denominator = "N";
    public const string Percent = "percent";
    public const string Estimate = "estimate";
    public const string Lower = "lower";
    public const string Upper = "upper";
    public const string PValue = "pValue";
    public const string TestStatistic = "statistic";
    public const string DegreesOfFreedom = "df";
    public const string Mean = "mean";
    public const string StandardDeviation = "sd";
    public const string Median = "median";
    public const string FirstQuartile = "q1";
    public const string ThirdQuartile = "q3";
    public const string Minimum = "min";
    public const string Maximum = "max";
    public const string EventCount = "events";
    public const string StandardError = "se";
    public const string StrataCount = "strata";
    public const string GeometricMean = "geometricMean";
    public const string CoefficientOfVariation = "cv";

    public static readonly IReadOnlyList<string> All =
    [
        SubjectCount, Denominator, Percent, Estimate, Lower, Upper, PValue, TestStatistic, DegreesOfFreedom,
        Mean, StandardDeviation, Median, FirstQuartile, ThirdQuartile, Minimum, Maximum,
        EventCount,
        StandardError,
        StrataCount,
        GeometricMean, CoefficientOfVariation,
    ];
}
