using MathNet.Numerics.Statistics;

namespace OutputForge.Stats.Descriptive;

/// <summary>
/// Descriptive statistics: n, mean, SD (divisor n - 1), median, Q1, Q3, minimum, maximum, geometric
/// mean and coefficient of variation (100 SD / mean).
/// <list type="bullet">
/// <item>Mean and SD come from <see cref="CentralMoments"/> (exact decimal sums, or the corrected
/// two-pass algorithm), so data with many constant leading digits keep their precision.</item>
/// <item>The median is the middle value, or the average of the two middle values.</item>
/// <item>Q1 and Q3 use a selectable MathNet <see cref="QuantileDefinition"/>. The default is
/// <see cref="QuantileDefinition.R2"/>: the empirical distribution function with averaging at
/// discontinuities (Hyndman and Fan 1996, Am Stat 50:361-365, definition 2), the definition that
/// clinical trial summaries usually use and so what an independent second programmer reproduces
/// (common practice). R's default is R7 (definition 7).</item>
/// <item>Geometric mean exp(mean(ln x)) only when every value is positive; otherwise null with a note.</item>
/// <item>CV% is null with a note when the mean is zero or the SD is unavailable.</item>
/// </list>
/// NaN or infinite values throw <see cref="ArgumentException"/>; missing values must be removed by the
/// caller (the count n is then the number of non-missing values).
/// </summary>
public static class DescriptiveStatistics
{
    /// <param name="values">The non-missing values.</param>
    /// <param name="quartileDefinition">How Q1 and Q3 are taken from the sorted values.</param>
    /// <param name="geometricMean">False leaves the geometric mean out (null, without its note): a table that does not
    /// show it skips the logarithm and exact mean of every value.</param>
    public static DescriptiveSummary Compute(IReadOnlyList<double> values, QuantileDefinition quartileDefinition = QuantileDefinition.R2,
        bool geometricMean = true)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Any(v => double.IsNaN(v) || double.IsInfinity(v)))
        {
            throw new ArgumentException("Values must be finite numbers; remove missing values before summarising.", nameof(values));
        }
        int n = values.Count;
        if (n == 0)
        {
            return new DescriptiveSummary(0, null, null, null, null, null, null, null, null, null) { Notes = ["No values."] };
        }
        var notes = new List<string>();
        var (mean, squares) = CentralMoments.Compute(values);
        double? sd = null;
        if (n >= 2)
        {
            sd = Math.Sqrt(squares / (n - 1));
        }
        else
        {
            notes.Add("The standard deviation needs at least two values.");
        }
        var sorted = SortedSample.Of(values);
        double median = n % 2 == 1 ? sorted[n / 2] : Midpoint(sorted[n / 2 - 1], sorted[n / 2]);
        double q1 = SortedArrayStatistics.QuantileCustom(sorted, 0.25, quartileDefinition);
        double q3 = SortedArrayStatistics.QuantileCustom(sorted, 0.75, quartileDefinition);
        double? geometric = null;
        if (geometricMean && sorted[0] > 0)
        {
            var logMean = CentralMoments.Mean(values.Select(v => Math.Log(v)).ToArray());
            geometric = Math.Exp(logMean);
        }
        else if (geometricMean)
        {
            notes.Add("The geometric mean needs every value to be positive.");
        }
        double? cv = null;
        if (sd is not null && mean != 0)
        {
            cv = 100 * sd.Value / mean;
        }
        else if (sd is not null)
        {
            notes.Add("The coefficient of variation is undefined because the mean is zero.");
        }
        return new DescriptiveSummary(n, mean, sd, median, q1, q3, sorted[0], sorted[^1], geometric, cv) { Notes = notes };
    }

    /// <summary>
    /// The average of two values taken as the decimals they were written as: (0.6 + 0.7) / 2 is
    /// 0.65 exactly, where binary arithmetic gives 0.6499999999999999 and a display at one decimal
    /// would round the wrong way. Values beyond the decimal range fall back to binary arithmetic.
    /// </summary>
    internal static double Midpoint(double a, double b)
    {
        if (Math.Abs(a) < 1e27 && Math.Abs(b) < 1e27)
        {
            return (double)(((decimal)a + (decimal)b) / 2);
        }
        return (a + b) / 2;
    }
}
