namespace OutputForge.Stats.Exact;

/// <summary>
/// The largest and smallest value V that the last two columns of a Fisher network can add from a node,
/// without listing their splits. With remaining row totals K_i and the second-to-last column total C,
/// the first column takes x_i (sum x_i = C, 0 &lt;= x_i &lt;= K_i) and the last is forced to K_i - x_i, so
/// V(x) = sum_i g_i(x_i) with g_i(x) = -log x! - log (K_i - x)!, a sum of concave functions (log of a
/// binomial coefficient, up to a constant).
/// <list type="bullet">
/// <item>Largest: a separable concave objective under a sum constraint is maximised by giving the C
/// units one at a time to the row with the largest next increment g_i(x_i + 1) - g_i(x_i) = log (K_i - x_i)
/// - log (x_i + 1) (Ibaraki and Katoh 1988, Resource Allocation Problems, ch. 4).</item>
/// <item>Smallest: a concave function attains its minimum over a polytope at a vertex, and the vertices
/// of {0 &lt;= x &lt;= K, sum x = C} have every coordinate but one at 0 or K_i (r - 1 box constraints tight
/// besides the sum); they are integer, so the minimum over the integer splits is the minimum over these
/// r 2^(r-1) candidates.</item>
/// </list>
/// Both are exactly the values the full enumeration finds (up to the order of the floating-point sum).
/// </summary>
internal static class FisherLastTwoColumnsBounds
{
    /// <summary>Beyond this many rows the r 2^(r-1) vertices cost more than they save; the caller enumerates instead.</summary>
    public const int MaxRows = 8;

    public static (double Max, double Min) Of(int[] capacities, int total, double[] logFactorial)
    {
        int rows = capacities.Length;
        var x = new int[rows];
        for (int unit = 0; unit < total; unit++)
        {
            int best = -1;
            double bestIncrement = double.NegativeInfinity;
            for (int i = 0; i < rows; i++)
            {
                if (x[i] < capacities[i])
                {
                    double increment = Math.Log(capacities[i] - x[i]) - Math.Log(x[i] + 1);
                    if (increment > bestIncrement)
                    {
                        bestIncrement = increment;
                        best = i;
                    }
                }
            }
            x[best]++;
        }
        double max = Value(x, capacities, logFactorial);

        double min = double.PositiveInfinity;
        for (int free = 0; free < rows; free++)
        {
            for (int mask = 0; mask < 1 << (rows - 1); mask++)
            {
                int placed = 0;
                for (int i = 0, bit = 0; i < rows; i++)
                {
                    if (i == free)
                    {
                        continue;
                    }
                    x[i] = (mask >> bit++ & 1) == 1 ? capacities[i] : 0;
                    placed += x[i];
                }
                x[free] = total - placed;
                if (x[free] >= 0 && x[free] <= capacities[free])
                {
                    min = Math.Min(min, Value(x, capacities, logFactorial));
                }
            }
        }
        return (max, min);
    }

    private static double Value(int[] x, int[] capacities, double[] logFactorial)
    {
        double value = 0;
        for (int i = 0; i < x.Length; i++)
        {
            value -= logFactorial[x[i]] + logFactorial[capacities[i] - x[i]];
        }
        return value;
    }
}
