using MathNet.Numerics.Distributions;

namespace OutputForge.Stats;

/// <summary>
/// Validation of a two-sided confidence level and the standard normal quantile z = Phi^-1(1 - alpha/2)
/// that the large-sample interval methods share.
/// </summary>
internal static class ConfidenceLevel
{
    public static void Validate(double level)
    {
        if (!(level > 0 && level < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(level), level, "The confidence level must lie strictly between 0 and 1.");
        }
    }

    /// <summary>Upper alpha/2 point of the standard normal distribution (1.959964 for 95%).</summary>
    public static double NormalQuantile(double level) => Normal.InvCDF(0, 1, 1 - (1 - level) / 2);
}
