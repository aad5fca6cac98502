using System.Globalization;

namespace OutputForge.Stats;

/// <summary>
/// Reads a double as the shortest decimal that round-trips to it (the value as written in the data),
/// so that sums, means and midpoints of data values are computed exactly: the median of 40.2 and 40.3
/// is 40.25, not the binary neighbour 40.2499999... that would then round the wrong way.
/// </summary>
internal static class ExactDecimal
{
    /// <summary>The values as decimals, or null when one of them is outside the decimal range (then the caller works in double).</summary>
    public static decimal[]? TryConvert(IReadOnlyList<double> values)
    {
        var result = new decimal[values.Count];
        for (int i = 0; i < values.Count; i++)
        {
            double value = values[i];
            if (double.IsNaN(value) || double.IsInfinity(value) || Math.Abs(value) >= 1e14)
            {
                return null;
            }
            result[i] = decimal.Parse(value.ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);
        }
        return result;
    }
}
