namespace OutputForge.Stats.Proportions;

/// <summary>
/// The Wilson (1927) score interval for one binomial proportion, without and with continuity
/// correction, in the closed forms of Newcombe (1998), Stat Med 17:857-872, methods 3 and 4.
/// Shared by <see cref="ProportionInterval"/> and the Newcombe hybrid score difference interval.
/// </summary>
internal static class WilsonScoreBounds
{
    /// <summary>Method 3: (2np + z^2 -/+ z sqrt(z^2 + 4np(1-p))) / (2(n + z^2)).</summary>
    public static (double Lower, double Upper) Uncorrected(int events, int n, double z)
    {
        double p = (double)events / n;
        double z2 = z * z;
        double centre = 2 * n * p + z2;
        double half = z * Math.Sqrt(z2 + 4 * n * p * (1 - p));
        double denominator = 2 * (n + z2);
        double lower = events == 0 ? 0 : (centre - half) / denominator;
        double upper = events == n ? 1 : (centre + half) / denominator;
        return (Math.Max(0, lower), Math.Min(1, upper));
    }

    /// <summary>
    /// Method 4: L = (2np + z^2 - 1 - z sqrt(z^2 - 2 - 1/n + 4p(n(1-p) + 1))) / (2(n + z^2)),
    /// U = (2np + z^2 + 1 + z sqrt(z^2 + 2 - 1/n + 4p(n(1-p) - 1))) / (2(n + z^2));
    /// L = 0 when p = 0 and U = 1 when p = 1, as Newcombe specifies.
    /// </summary>
    public static (double Lower, double Upper) Corrected(int events, int n, double z)
    {
        double p = (double)events / n;
        double q = 1 - p;
        double z2 = z * z;
        double denominator = 2 * (n + z2);
        double lower = events == 0
            ? 0
            : (2 * n * p + z2 - 1 - z * Math.Sqrt(Math.Max(0, z2 - 2 - 1.0 / n + 4 * p * (n * q + 1)))) / denominator;
        double upper = events == n
            ? 1
            : (2 * n * p + z2 + 1 + z * Math.Sqrt(Math.Max(0, z2 + 2 - 1.0 / n + 4 * p * (n * q - 1)))) / denominator;
        return (Math.Max(0, lower), Math.Min(1, upper));
    }
}
