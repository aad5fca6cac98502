namespace OutputForge.Analysis.Continuous;

/// <summary>
/// n, mean, standard deviation (n - 1 divisor), median (mean of the two middle values for even n),
/// minimum and maximum of the non-missing values of one column of a table (common practice).
/// The mean is accumulated in the order given and the SD from deviations about the mean
/// (two-pass), which keeps full accuracy for data far from zero.
/// </summary>
internal sealed record SampleSummary(int N, double Mean, double StandardDeviation, double Median, double Minimum, double Maximum)
{
    public static SampleSummary Of(IReadOnlyList<double> values)
    {
        var n = values.Count;
        if (n == 0)
        {
            return new SampleSummary(0, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN);
        }
        var mean = values.Sum() / n;
        var sd = n < 2 ? double.NaN : Math.Sqrt(values.Sum(v => (v - mean) * (v - mean)) / (n - 1));
        var sorted = values.Order().ToList();
        var median = n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
        return new SampleSummary(n, mean, sd, median, sorted[0], sorted[^1]);
    }
}
