namespace OutputForge.Demo;

/// <summary>
/// Natural logarithm and exponential written with IEEE 754 additions, multiplications and divisions
/// only. Math.Log and Math.Exp call the platform's C library, whose last-bit results may differ between
/// operating systems and processors; the demonstration files must be byte-identical everywhere, and a
/// one-ulp difference can flip a value rounded to one decimal.
/// Method: argument reduction by powers of two, then the atanh series for log and the Taylor series for
/// exp (Muller, "Elementary Functions: Algorithms and Implementation", 3rd ed., 2016, chapters 5 and 11);
/// the two-part ln 2 constants are those of fdlibm (Cody-Waite reduction).
/// </summary>
internal static class PortableMath
{
    private const double Ln2 = 0.6931471805599453094;
    private const double Ln2High = 6.93147180369123816490e-01;
    private const double Ln2Low = 1.90821492927058770002e-10;
    private const double Sqrt2 = 1.4142135623730950488;

    /// <summary>ln(x) for positive normal x, accurate to about one ulp.</summary>
    public static double Log(double x)
    {
        if (!(x > 0) || double.IsInfinity(x) || x < double.Epsilon * 4503599627370496.0)
            throw new ArgumentOutOfRangeException(nameof(x), "Log is defined here for positive normal numbers only.");

        var bits = BitConverter.DoubleToInt64Bits(x);
        var exponent = (int)((bits >> 52) & 0x7FF) - 1023;
        var mantissa = BitConverter.Int64BitsToDouble((bits & 0x000FFFFFFFFFFFFFL) | 0x3FF0000000000000L);
        if (mantissa > Sqrt2)
        {
            mantissa *= 0.5;
            exponent++;
        }

        // ln(m) = 2 atanh(s) = 2 (s + s^3/3 + s^5/5 + ...), s = (m-1)/(m+1), |s| <= 0.1716.
        var s = (mantissa - 1.0) / (mantissa + 1.0);
        var s2 = s * s;
        var series = 1.0 / 25.0;
        for (var k = 11; k >= 0; k--)
            series = 1.0 / (2 * k + 1) + s2 * series;
        return exponent * Ln2 + 2.0 * s * series;
    }

    /// <summary>e^x for |x| below 700, accurate to about one ulp.</summary>
    public static double Exp(double x)
    {
        if (double.IsNaN(x) || x > 700 || x < -700)
            throw new ArgumentOutOfRangeException(nameof(x), "Exp is defined here for |x| <= 700 only.");

        var k = Math.Round(x / Ln2, MidpointRounding.ToEven);
        var r = (x - k * Ln2High) - k * Ln2Low;

        // Taylor series of e^r on |r| <= ln(2)/2; the degree-16 remainder is below 1e-19.
        var sum = 1.0;
        for (var n = 16; n >= 1; n--)
            sum = 1.0 + r * sum / n;
        return Math.ScaleB(sum, (int)k);
    }
}
