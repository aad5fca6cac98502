using MathNet.Numerics.Statistics;

namespace OutputForge.Stats.Descriptive;

/// <summary>
/// Median and quartiles computed on the values as the decimals they were written as (each double
/// read as its shortest round-trip decimal), so that an average of two values lands exactly on the
/// decimal midpoint: the median of 0.6 and 0.7 is 0.65, whereas (0.6 + 0.7) / 2 in binary is
/// 0.6499999999999999 and would then display as 0.6 instead of 0.7 under half-away-from-zero
/// rounding. Definitions 2 (averaging at discontinuities) and 7 (linear, R's default)
/// of Hyndman and Fan (1996), Am Stat 50:361-365; other definitions, and values outside the decimal
/// range, are left to MathNet.
/// </summary>
public static class ExactQuantiles
{
    /// <summary>The median (the middle value, or the exact average of the two middle values).</summary>
    public static double Median(IReadOnlyList<double> values) => Quantile(values, 0.5m, QuantileDefinition.R2);

    /// <summary>The <paramref name="p"/>-quantile of a non-empty sample under <paramref name="definition"/>.</summary>
    public static double Quantile(IReadOnlyList<double> values, decimal p, QuantileDefinition definition)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0)
        {
            throw new ArgumentException("The sample is empty.", nameof(values));
        }
        var sorted = SortedSample.Of(values);
        if ((definition == QuantileDefinition.R2 || definition == QuantileDefinition.R7) && TryDecimals(sorted, out var exact))
        {
            return (double)(definition == QuantileDefinition.R2 ? Type2(exact, p) : Type7(exact, p));
        }
        return SortedArrayStatistics.QuantileCustom(sorted, (double)p, definition);
    }

    /// <summary>
    /// The median and the quartiles at 0.25 and 0.75 under <paramref name="definition"/> of a non-empty
    /// sample, the same values as <see cref="Median"/> and <see cref="Quantile"/> give, from one sort and
    /// one decimal conversion of the sample.
    /// </summary>
    public static (double Median, double FirstQuartile, double ThirdQuartile) Quartiles(IReadOnlyList<double> values, QuantileDefinition definition)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0)
        {
            throw new ArgumentException("The sample is empty.", nameof(values));
        }
        var sorted = SortedSample.Of(values);
        var exact = TryDecimals(sorted, out var decimals) ? decimals : null;
        return (FromSorted(sorted, exact, 0.5m, QuantileDefinition.R2),
            FromSorted(sorted, exact, 0.25m, definition),
            FromSorted(sorted, exact, 0.75m, definition));
    }

    private static double FromSorted(double[] sorted, decimal[]? exact, decimal p, QuantileDefinition definition)
    {
        if ((definition == QuantileDefinition.R2 || definition == QuantileDefinition.R7) && exact is not null)
        {
            return (double)(definition == QuantileDefinition.R2 ? Type2(exact, p) : Type7(exact, p));
        }
        return SortedArrayStatistics.QuantileCustom(sorted, (double)p, definition);
    }

    /// <summary>Type 2: with np = j + g, x_(j+1) when g &gt; 0, else the average of x_(j) and x_(j+1).</summary>
    private static decimal Type2(decimal[] x, decimal p)
    {
        int n = x.Length;
        decimal np = n * p;
        int j = (int)decimal.Floor(np);
        if (np > j)
        {
            return x[Math.Min(j, n - 1)];
        }
        return j == 0 ? x[0] : j >= n ? x[n - 1] : (x[j - 1] + x[j]) / 2;
    }

    /// <summary>Type 7: h = (n - 1)p; x_(floor h + 1) + (h - floor h)(x_(floor h + 2) - x_(floor h + 1)).</summary>
    private static decimal Type7(decimal[] x, decimal p)
    {
        decimal h = (x.Length - 1) * p;
        int low = (int)decimal.Floor(h);
        int high = Math.Min(low + 1, x.Length - 1);
        return x[low] + (h - low) * (x[high] - x[low]);
    }

    private static bool TryDecimals(double[] sorted, out decimal[] exact)
    {
        exact = new decimal[sorted.Length];
        var convert = new RoundTripDecimal();
        for (int i = 0; i < sorted.Length; i++)
        {
            double value = sorted[i];
            if (double.IsNaN(value) || double.IsInfinity(value) || Math.Abs(value) > 1e15 || (value != 0 && Math.Abs(value) < 1e-8))
            {
                return false;
            }
            exact[i] = convert.Of(value);
        }
        return true;
    }
}
