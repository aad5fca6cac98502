namespace OutputForge.Stats.Descriptive;

/// <summary>
/// The values of a sample in ascending order, as a new array. An in-place array sort is many times
/// faster than a LINQ ordering, but it is not stable, and the one pair of doubles that compare equal
/// yet differ (0 and -0) could then change places; a sample holding a negative zero is therefore
/// ordered with the stable LINQ sort, which keeps such values in their original order.
/// </summary>
internal static class SortedSample
{
    private static readonly long NegativeZeroBits = BitConverter.DoubleToInt64Bits(-0.0);

    public static double[] Of(IReadOnlyList<double> values)
    {
        var sorted = new double[values.Count];
        var negativeZero = false;
        for (var i = 0; i < sorted.Length; i++)
        {
            sorted[i] = values[i];
            negativeZero |= BitConverter.DoubleToInt64Bits(sorted[i]) == NegativeZeroBits;
        }
        if (negativeZero)
        {
            return values.OrderBy(v => v).ToArray();
        }
        Array.Sort(sorted);
        return sorted;
    }
}
