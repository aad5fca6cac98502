namespace OutputForge.Stats.Models;

/// <summary>
/// Whether a sum of squared deviations is zero up to rounding, relative to the data's scale. Values that are all equal
/// (or fitted exactly) leave deviations of a few units in the last place of the values, not zero; a variance made of
/// them gives standard errors and p-values of pure rounding noise (e.g. p = 0.33 for a difference of 1.5e-16 with a
/// standard error of 3.3e-16). The rounding error of a sum of n terms grows like sqrt(n) times the unit roundoff
/// (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed. 2002, section 4.2, the probabilistic bound);
/// a root-mean-square deviation below 64 sqrt(n) unit roundoffs of the values' root mean square is taken as zero.
/// </summary>
public static class DegenerateVariance
{
    private const double Roundoff = 1.1102230246251565e-16;  // 2^-53, the unit roundoff of IEEE double precision

    /// <param name="sumOfSquares">The sum of squared deviations (e.g. a residual sum of squares).</param>
    /// <param name="sumOfSquaredValues">The sum of the squared values themselves (their scale).</param>
    /// <param name="count">The number of values.</param>
    public static bool Holds(double sumOfSquares, double sumOfSquaredValues, int count)
    {
        if (count <= 0 || sumOfSquares <= 0)
        {
            return true;
        }
        var tolerance = 64 * Roundoff * Math.Sqrt(count);
        return sumOfSquares <= tolerance * tolerance * sumOfSquaredValues;
    }

    /// <summary>The reason given for a statistic left not estimable by a degenerate variance.</summary>
    public const string Reason = "the variance is zero up to rounding (the analysed values are all equal, or fitted exactly), so standard errors, intervals and tests are not estimable";
}
