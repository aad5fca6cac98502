namespace OutputForge.Stats.Exact;

/// <summary>
/// The past values of one node of a Fisher network (Mehta and Patel 1983, JASA 78:427-434): the
/// distinct values V = -sum log n_ij! of the partial tables that reach the node, in increasing order,
/// with how many partial tables share each value and the running log-sums of count x exp(value), so
/// that all pasts below a limit are found by binary search and summed at once.
/// <para>
/// Values are merged on a grid of 1e-10 in log probability (the key is value x 1e10, rounded): two
/// partial tables whose values differ by less than that are the same multiset of cells computed in
/// a different order, and far inside the 1e-7 tie tolerance of the p-value. The value kept for a key
/// is the first exact value seen, not the grid point, so merging adds no rounding to the p-value.
/// </para>
/// </summary>
internal sealed class FisherPastValues
{
    internal const double MergeResolution = 1e10;

    public required double[] Values { get; init; }
    public required double[] Counts { get; init; }
    public required double[] LogPrefix { get; init; }

    public static long KeyOf(double value) => (long)Math.Round(value * MergeResolution);

    /// <summary>The start of every network: the empty partial table, value 0, one path.</summary>
    public static FisherPastValues Start() => Sorted([0], [1]);

    /// <summary>Values already in increasing order with their counts; the running log-sums are added.</summary>
    public static FisherPastValues Sorted(double[] values, double[] counts)
    {
        var logPrefix = new double[values.Length + 1];
        logPrefix[0] = double.NegativeInfinity;
        for (int i = 0; i < values.Length; i++)
        {
            logPrefix[i + 1] = LogAdd(logPrefix[i], Math.Log(counts[i]) + values[i]);
        }
        return new FisherPastValues { Values = values, Counts = counts, LogPrefix = logPrefix };
    }

    /// <summary>How many past values are at most <paramref name="limit"/>.</summary>
    public int CountAtMost(double limit) => UpperBound(Values, limit);

    /// <summary>log(exp(a) + exp(b)) without overflow; log 0 is negative infinity.</summary>
    public static double LogAdd(double a, double b)
    {
        if (double.IsNegativeInfinity(a))
        {
            return b;
        }
        if (double.IsNegativeInfinity(b))
        {
            return a;
        }
        return Math.Max(a, b) + Math.Log(1 + Math.Exp(-Math.Abs(a - b)));
    }

    /// <summary>The number of entries of an increasing array that are at most <paramref name="limit"/>.</summary>
    public static int UpperBound(double[] sorted, double limit)
    {
        int low = 0;
        int high = sorted.Length;
        while (low < high)
        {
            int mid = (low + high) >>> 1;
            if (sorted[mid] <= limit)
            {
                low = mid + 1;
            }
            else
            {
                high = mid;
            }
        }
        return low;
    }
}
