namespace OutputForge.Stats.Descriptive;

/// <summary>
/// The mean and the sum of squared deviations from it, computed so that data with many constant
/// leading digits (NIST StRD SmLs07-09: 1000000000000.4, ...) keep their precision.
/// Each double is taken as the shortest decimal that round-trips to it (the number as written in the
/// data) and the sums are formed in 28-digit decimal arithmetic, where such data are exact. Values
/// outside the comfortable decimal range (|x| above 1e15, or non-zero below 1e-8) fall back to the
/// corrected two-pass algorithm in double precision (Chan, Golub and LeVeque 1983, Am Stat 37:242-247),
/// which is already stable for ordinary data.
/// </summary>
internal static class CentralMoments
{
    public static (double Mean, double SumOfSquares) Compute(IReadOnlyList<double> values)
    {
        if (values.Count == 0)
        {
            throw new ArgumentException("At least one value is needed.", nameof(values));
        }
        return TryExact(values, out decimal mean, out decimal squares) ? ((double)mean, (double)squares) : TwoPass(values);
    }

    /// <summary>
    /// The mean alone, the same value as <see cref="Compute"/> gives. Where the decimal sums apply, the
    /// sum of squares of <see cref="TryExact"/> is skipped: it cannot overflow (and so cannot send
    /// <see cref="Compute"/> to the two-pass fallback) when n times the largest squared deviation stays
    /// below 1e28, under the decimal maximum of 7.9e28; otherwise <see cref="Compute"/> decides. Squaring
    /// deviations of 17 significant digits (logarithms, say) is the slow part of the decimal sums.
    /// </summary>
    public static double Mean(IReadOnlyList<double> values)
    {
        if (values.Count == 0)
        {
            throw new ArgumentException("At least one value is needed.", nameof(values));
        }
        return TryExactMean(values, out decimal mean) ? (double)mean : Compute(values).Mean;
    }

    private static bool TryExactMean(IReadOnlyList<double> values, out decimal mean)
    {
        mean = 0;
        var exact = new decimal[values.Count];
        var convert = new RoundTripDecimal();
        for (int i = 0; i < values.Count; i++)
        {
            double x = values[i];
            double magnitude = Math.Abs(x);
            if (magnitude > 1e15 || (x != 0 && magnitude < 1e-8))
            {
                return false;
            }
            exact[i] = convert.Of(x);
        }
        decimal largest = 0;
        try
        {
            decimal sum = 0;
            foreach (decimal x in exact)
            {
                sum += x;
            }
            mean = sum / exact.Length;
            foreach (decimal x in exact)
            {
                largest = Math.Max(largest, Math.Abs(x - mean));
            }
        }
        catch (OverflowException)
        {
            return false;
        }
        double bound = (double)largest;
        return bound * bound * exact.Length < 1e28;
    }

    /// <summary>The decimal mean and sum of squares, or false when the values do not suit decimal arithmetic.</summary>
    public static bool TryExact(IReadOnlyList<double> values, out decimal mean, out decimal sumOfSquares)
    {
        mean = 0;
        sumOfSquares = 0;
        var exact = new decimal[values.Count];
        var convert = new RoundTripDecimal();
        for (int i = 0; i < values.Count; i++)
        {
            double x = values[i];
            double magnitude = Math.Abs(x);
            if (magnitude > 1e15 || (x != 0 && magnitude < 1e-8))
            {
                return false;
            }
            exact[i] = convert.Of(x);
        }
        try
        {
            decimal sum = 0;
            foreach (decimal x in exact)
            {
                sum += x;
            }
            mean = sum / exact.Length;
            decimal squares = 0;
            foreach (decimal x in exact)
            {
                decimal deviation = x - mean;
                squares += deviation * deviation;
            }
            sumOfSquares = squares;
            return true;
        }
        catch (OverflowException)
        {
            return false;
        }
    }

    private static (double Mean, double SumOfSquares) TwoPass(IReadOnlyList<double> values)
    {
        double mean = values.Average();
        double squares = 0;
        double compensation = 0;
        foreach (double x in values)
        {
            double deviation = x - mean;
            squares += deviation * deviation;
            compensation += deviation;
        }
        return (mean + compensation / values.Count, Math.Max(0, squares - compensation * compensation / values.Count));
    }
}
