using MathNet.Numerics.Distributions;

namespace OutputForge.Tests.Support;

/// <summary>
/// Textbook formulas written out again in the tests, independently of OutputForge.Stats, to
/// recompute the numbers of an end-to-end run.
/// </summary>
public static class IndependentFormulas
{
    /// <summary>Wilson score interval: Newcombe RG (1998) Stat Med 17:857-872, method 3, equation without correction.</summary>
    public static (double Lower, double Upper) Wilson(int r, int n, double level = 0.95)
    {
        var z = Normal.InvCDF(0, 1, 1 - (1 - level) / 2);
        var p = (double)r / n;
        var centre = 2 * n * p + z * z;
        var spread = z * Math.Sqrt(z * z + 4 * n * p * (1 - p));
        var denominator = 2 * (n + z * z);
        return ((centre - spread) / denominator, (centre + spread) / denominator);
    }

    /// <summary>Newcombe hybrid score interval for p1 - p2: Newcombe RG (1998) Stat Med 17:873-890, method 10.</summary>
    public static (double Lower, double Upper) Newcombe(int r1, int n1, int r2, int n2, double level = 0.95)
    {
        var p1 = (double)r1 / n1;
        var p2 = (double)r2 / n2;
        var (l1, u1) = Wilson(r1, n1, level);
        var (l2, u2) = Wilson(r2, n2, level);
        var d = p1 - p2;
        return (d - Math.Sqrt((p1 - l1) * (p1 - l1) + (u2 - p2) * (u2 - p2)),
                d + Math.Sqrt((u1 - p1) * (u1 - p1) + (p2 - l2) * (p2 - l2)));
    }

    /// <summary>Pearson chi-square of a 2 x 2 table, as the square of the pooled two-proportion z statistic.</summary>
    public static double PearsonPValue(int r1, int n1, int r2, int n2)
    {
        var pooled = (double)(r1 + r2) / (n1 + n2);
        var z = ((double)r1 / n1 - (double)r2 / n2) / Math.Sqrt(pooled * (1 - pooled) * (1.0 / n1 + 1.0 / n2));
        return 1 - ChiSquared.CDF(1, z * z);
    }
}
