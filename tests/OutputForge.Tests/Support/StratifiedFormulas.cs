using MathNet.Numerics.Distributions;

namespace OutputForge.Tests.Support;

/// <summary>
/// The 2 x 2 x K formulas written out again in the tests, independently of OutputForge.Stats, to recompute
/// the stratified rows of an end-to-end run. Each stratum is (a, n1, c, n2): responders and subjects of the
/// active arm, then of the control.
/// </summary>
public static class StratifiedFormulas
{
    private static readonly double Z95 = Normal.InvCDF(0, 1, 0.975);

    /// <summary>Cochran (1954) / Mantel-Haenszel (1959) statistic without continuity correction and its chi-square(1) p-value.</summary>
    public static (double Statistic, double P) Cmh(IReadOnlyList<(int A, int N1, int C, int N2)> strata)
    {
        double observedMinusExpected = 0, variance = 0;
        foreach (var (a, n1, c, n2) in strata)
        {
            double t = n1 + n2, m1 = a + c, m2 = t - m1;
            observedMinusExpected += a - n1 * m1 / t;
            variance += n1 * (double)n2 * m1 * m2 / (t * t * (t - 1));
        }
        var statistic = observedMinusExpected * observedMinusExpected / variance;
        return (statistic, 1 - ChiSquared.CDF(1, statistic));
    }

    /// <summary>Mantel-Haenszel risk difference (weights n1 n2 / T) with Sato's (1989) variance.</summary>
    public static (double Estimate, double Lower, double Upper) RiskDifference(IReadOnlyList<(int A, int N1, int C, int N2)> strata)
    {
        double top = 0, bottom = 0, p = 0, q = 0;
        foreach (var (a, n1, c, n2) in strata)
        {
            double t = n1 + n2;
            top += (a * (double)n2 - c * (double)n1) / t;
            bottom += n1 * (double)n2 / t;
            p += (n1 * (double)n1 * c - n2 * (double)n2 * a + n1 * (double)n2 * (n2 - n1) / 2.0) / (t * t);
            q += (a * (double)(n2 - c) + c * (double)(n1 - a)) / (2 * t);
        }
        var rd = top / bottom;
        var se = Math.Sqrt((rd * p + q) / (bottom * bottom));
        return (rd, rd - Z95 * se, rd + Z95 * se);
    }

    /// <summary>Mantel-Haenszel relative risk with the Greenland-Robins (1985) variance of its log.</summary>
    public static (double Estimate, double Lower, double Upper) RelativeRisk(IReadOnlyList<(int A, int N1, int C, int N2)> strata)
    {
        double r = 0, s = 0, v = 0;
        foreach (var (a, n1, c, n2) in strata)
        {
            double t = n1 + n2;
            r += a * (double)n2 / t;
            s += c * (double)n1 / t;
            v += (n1 * (double)n2 * (a + c) - a * (double)c * t) / (t * t);
        }
        var rr = r / s;
        var se = Math.Sqrt(v / (r * s));
        return (rr, rr * Math.Exp(-Z95 * se), rr * Math.Exp(Z95 * se));
    }

    /// <summary>Mantel-Haenszel odds ratio with the Robins-Breslow-Greenland (1986) variance of its log.</summary>
    public static (double Estimate, double Lower, double Upper) OddsRatio(IReadOnlyList<(int A, int N1, int C, int N2)> strata)
    {
        double r = 0, s = 0, pr = 0, mixed = 0, qs = 0;
        foreach (var (a, n1, c, n2) in strata)
        {
            double t = n1 + n2, b = n1 - a, d = n2 - c;
            double rk = a * d / t, sk = b * c / t, pk = (a + d) / t, qk = (b + c) / t;
            r += rk;
            s += sk;
            pr += pk * rk;
            mixed += pk * sk + qk * rk;
            qs += qk * sk;
        }
        var or = r / s;
        var se = Math.Sqrt(pr / (2 * r * r) + mixed / (2 * r * s) + qs / (2 * s * s));
        return (or, or * Math.Exp(-Z95 * se), or * Math.Exp(Z95 * se));
    }

    /// <summary>
    /// Breslow-Day statistic with Tarone's (1985) correction; the expected cell under the common
    /// Mantel-Haenszel odds ratio found here by bisection of the odds-ratio equation (not by its quadratic root).
    /// Strata with no or only responders are left out.
    /// </summary>
    public static (double Statistic, int Df, double P) BreslowDayTarone(IReadOnlyList<(int A, int N1, int C, int N2)> strata)
    {
        var psi = OddsRatio(strata).Estimate;
        double x2 = 0, sumA = 0, sumE = 0, sumV = 0;
        var used = 0;
        foreach (var (a, n1, c, n2) in strata)
        {
            int m1 = a + c;
            if (m1 == 0 || m1 == n1 + n2)
            {
                continue;
            }
            double lo = Math.Max(0, m1 - n2), hi = Math.Min(n1, m1);
            for (var i = 0; i < 200; i++)
            {
                var mid = (lo + hi) / 2;
                var odds = mid * (n2 - m1 + mid) / ((n1 - mid) * (m1 - mid));
                if (odds < psi) lo = mid; else hi = mid;
            }
            var e = (lo + hi) / 2;
            var v = 1 / (1 / e + 1 / (n1 - e) + 1 / (m1 - e) + 1 / (n2 - m1 + e));
            x2 += (a - e) * (a - e) / v;
            sumA += a;
            sumE += e;
            sumV += v;
            used++;
        }
        x2 -= (sumA - sumE) * (sumA - sumE) / sumV;
        return (x2, used - 1, 1 - ChiSquared.CDF(used - 1, x2));
    }
}
