using System.Globalization;

namespace OutputForge.Layout;

/// <summary>
/// The display rules for numbers. Rounding is half away from zero on the decimal value of the
/// number (40.25 -> 40.3, 162.85 -> 162.9), never banker's rounding and never rounding of the
/// binary double's exact expansion (common practice in clinical reporting; the double is first
/// read as the shortest decimal that round-trips, which is what the data and a hand check see).
/// </summary>
public static class NumberText
{
    /// <summary>The value rounded for display, as a decimal (so Excel cells hold exactly what is shown).</summary>
    public static decimal Rounded(double value, int decimals)
    {
        var exact = decimal.Parse(value.ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);
        var rounded = Math.Round(exact, decimals, MidpointRounding.AwayFromZero);
        // A value that rounds to zero prints without a sign: "-0.0" would claim a direction the number does not show.
        return rounded == 0m ? 0m : rounded;
    }

    public static string Fixed(double value, int decimals)
    {
        if (Math.Abs(value) >= 7.9e27)
        {
            return value.ToString("E3", CultureInfo.InvariantCulture);
        }
        var rounded = Rounded(value, decimals);
        return rounded.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }

    public static string Count(double value) => Fixed(value, 0);

    /// <summary>
    /// A percentage that marks its edges: one above 0 that would round to 0 shows as "&lt;0.1"
    /// (with 1 decimal; "&lt;1" with none), one below 100 that would round to 100 as "&gt;99.9",
    /// so that the text never claims none or all when that is not so (common practice).
    /// </summary>
    public static string PercentWithEdges(double percent, int decimals)
    {
        var rounded = Rounded(percent, decimals);
        var step = Math.Pow(10, -decimals);
        if (percent > 0 && rounded == 0m)
        {
            return "<" + Fixed(step, decimals);
        }
        if (percent < 100 && rounded == 100m)
        {
            return ">" + Fixed(100 - step, decimals);
        }
        return Fixed(percent, decimals);
    }

    /// <summary>
    /// A p-value: "&lt;floor" below the floor (e.g. "&lt;0.001"), "&gt;0.999" above 1 minus the floor's
    /// step, otherwise with as many decimals as the floor has (at least 3).
    /// </summary>
    public static string PValue(double p, double floor)
    {
        var decimals = PValueDecimals(floor);
        if (p < floor)
        {
            return "<" + floor.ToString("0." + new string('#', decimals), CultureInfo.InvariantCulture);
        }
        var ceiling = 1 - Math.Pow(10, -decimals);
        if (p > ceiling)
        {
            return ">" + Fixed(ceiling, decimals);
        }
        return Fixed(p, decimals);
    }

    /// <summary>The decimals p-values are shown with: as many as the floor has, at least 3.</summary>
    public static int PValueDecimals(double floor) => Math.Max(3, DecimalsOf(floor));

    private static int DecimalsOf(double value)
    {
        var text = value.ToString("R", CultureInfo.InvariantCulture);
        var dot = text.IndexOf('.');
        return dot < 0 ? 0 : text.Length - dot - 1;
    }
}
