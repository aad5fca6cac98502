namespace OutputForge.Stats;

/// <summary>
/// n, mean, sample standard deviation (divisor n - 1), median, first and third quartiles, minimum
/// and maximum of a sample. Values are taken as the decimals they were written as (see
/// <see cref="ExactDecimal"/>): the mean and quantiles are then exact decimals, so a median that
/// lies exactly on a rounding midpoint (40.25) stays on it. The SD uses two passes (deviations from
/// the mean), which keeps its digits when the values share many leading digits.
/// </summary>
public static class DescriptiveStatistics
{
    /// <summary>Summarizes <paramref name="values"/>; NaN values (missing) are not allowed: leave them out first.</summary>
    public static DescriptiveSummary Compute(IReadOnlyList<double> values, QuantileMethod quantiles = QuantileMethod.HyndmanFan2)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Any(double.IsNaN))
        {
            throw new ArgumentException("The sample holds NaN; leave missing values out before summarizing.", nameof(values));
        }
        int n = values.Count;
        if (n == 0)
        {
            return new DescriptiveSummary(0, null, null, null, null, null, null, null);
        }
        var exact = ExactDecimal.TryConvert(values);
        if (exact is not null)
        {
            try
            {
                return FromDecimals(exact, quantiles);
            }
            catch (OverflowException)
            {
                // Squares beyond the decimal range: the double computation below is then the better one.
            }
        }
        return FromDoubles(values, quantiles);
    }

    private static DescriptiveSummary FromDecimals(decimal[] values, QuantileMethod method)
    {
        var sorted = values.Order().ToArray();
        int n = sorted.Length;
        decimal mean = values.Sum() / n;
        double? sd = null;
        if (n > 1)
        {
            decimal squares = 0m;
            foreach (var value in values)
            {
                decimal deviation = value - mean;
                squares += deviation * deviation;
            }
            sd = Math.Sqrt((double)(squares / (n - 1)));
        }
        return new DescriptiveSummary(n, (double)mean, sd,
            (double)Quantile(sorted, 0.5m, method), (double)Quantile(sorted, 0.25m, method), (double)Quantile(sorted, 0.75m, method),
            (double)sorted[0], (double)sorted[^1]);
    }

    private static DescriptiveSummary FromDoubles(IReadOnlyList<double> values, QuantileMethod method)
    {
        var sorted = values.Order().ToArray();
        int n = sorted.Length;
        double mean = values.Sum() / n;
        double? sd = n > 1 ? Math.Sqrt(values.Sum(v => (v - mean) * (v - mean)) / (n - 1)) : null;
        return new DescriptiveSummary(n, mean, sd,
            QuantileOfDoubles(sorted, 0.5, method), QuantileOfDoubles(sorted, 0.25, method), QuantileOfDoubles(sorted, 0.75, method),
            sorted[0], sorted[^1]);
    }

    /// <summary>Hyndman and Fan (1996) types 2 and 7 on sorted values (order statistics x_1..x_n, here 0-based).</summary>
    internal static decimal Quantile(decimal[] sorted, decimal p, QuantileMethod method)
    {
        int n = sorted.Length;
        if (method == QuantileMethod.HyndmanFan7)
        {
            decimal h = (n - 1) * p;
            int low = (int)Math.Floor(h);
            int high = Math.Min(low + 1, n - 1);
            return sorted[low] + (h - low) * (sorted[high] - sorted[low]);
        }
        decimal np = n * p;
        int j = (int)Math.Floor(np);
        if (np > j)
        {
            return sorted[Math.Min(j, n - 1)];
        }
        return j == 0 ? sorted[0] : (sorted[j - 1] + sorted[Math.Min(j, n - 1)]) / 2;
    }

    private static double QuantileOfDoubles(double[] sorted, double p, QuantileMethod method)
    {
        int n = sorted.Length;
        if (method == QuantileMethod.HyndmanFan7)
        {
            double h = (n - 1) * p;
            int low = (int)Math.Floor(h);
            int high = Math.Min(low + 1, n - 1);
            return sorted[low] + (h - low) * (sorted[high] - sorted[low]);
        }
        double np = n * p;
        int j = (int)Math.Floor(np);
        if (np > j)
        {
            return sorted[Math.Min(j, n - 1)];
        }
        return j == 0 ? sorted[0] : (sorted[j - 1] + sorted[Math.Min(j, n - 1)]) / 2;
    }
}
