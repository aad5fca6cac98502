namespace OutputForge.Stats.Proportions;

/// <summary>
/// The Miettinen-Nurminen (1985, Stat Med 4:213-226) score statistic for the difference of two
/// independent proportions, and its inversion into a confidence interval.
/// For a hypothesised difference delta the statistic is
/// Z(delta) = (p1 - p2 - delta) / sqrt( (p1~ q1~ / n1 + p2~ q2~ / n2) * N / (N - 1) ),
/// where p1~ - p2~ = delta are the maximum likelihood estimates restricted to that difference
/// (closed-form cubic root given by Miettinen and Nurminen, Appendix 1; also Farrington and Manning
/// 1990, Stat Med 9:1447-1454) and N = n1 + n2 gives their variance factor N/(N - 1).
/// Z is monotone decreasing in delta, so each limit is found by bisection: the lower limit solves
/// Z(delta) = z on [-1, p1 - p2], the upper solves Z(delta) = -z on [p1 - p2, 1].
/// </summary>
internal static class MiettinenNurminenScore
{
    private const int BisectionSteps = 200;

    public static (double Lower, double Upper) Interval(int events1, int n1, int events2, int n2, double z)
    {
        double p1 = (double)events1 / n1;
        double p2 = (double)events2 / n2;
        double difference = p1 - p2;
        double lower = difference <= -1 ? -1 : Solve(-1, difference, z, events1, n1, events2, n2);
        double upper = difference >= 1 ? 1 : Solve(difference, 1, -z, events1, n1, events2, n2);
        return (lower, upper);
    }

    /// <summary>
    /// Bisection for Z(delta) = target on [left, right], where Z is decreasing, Z(left) is at least the target
    /// (or +infinity) and Z(right) at most the target. When the target is not crossed inside the bracket the
    /// limit is the end of the parameter space.
    /// </summary>
    private static double Solve(double left, double right, double target, int x1, int n1, int x2, int n2)
    {
        bool forLower = target > 0;
        double outer = forLower ? left : right;
        if (forLower ? Statistic(outer, x1, n1, x2, n2) <= target : Statistic(outer, x1, n1, x2, n2) >= target)
        {
            return outer;
        }
        double a = left;
        double b = right;
        for (int step = 0; step < BisectionSteps && b - a > 1e-15; step++)
        {
            double mid = 0.5 * (a + b);
            if (Statistic(mid, x1, n1, x2, n2) > target)
            {
                a = mid;
            }
            else
            {
                b = mid;
            }
        }
        return 0.5 * (a + b);
    }

    /// <summary>Z(delta); +/- infinity where the restricted variance vanishes with a non-zero numerator.</summary>
    public static double Statistic(double delta, int x1, int n1, int x2, int n2)
    {
        double p1 = (double)x1 / n1;
        double p2 = (double)x2 / n2;
        double numerator = p1 - p2 - delta;
        if (numerator == 0)
        {
            return 0;
        }
        var (r1, r2) = RestrictedEstimates(delta, x1, n1, x2, n2);
        int total = n1 + n2;
        double variance = (r1 * (1 - r1) / n1 + r2 * (1 - r2) / n2) * total / (total - 1.0);
        if (variance <= 0)
        {
            return numerator > 0 ? double.PositiveInfinity : double.NegativeInfinity;
        }
        return numerator / Math.Sqrt(variance);
    }

    /// <summary>
    /// Maximum likelihood estimates of (p1, p2) under p1 - p2 = delta: the root of the cubic
    /// L3 p^3 + L2 p^2 + L1 p + L0 = 0 in p1 given by Miettinen and Nurminen (1985), Appendix 1,
    /// in the trigonometric form, kept inside the admissible range [max(0, delta), min(1, 1 + delta)].
    /// </summary>
    public static (double P1, double P2) RestrictedEstimates(double delta, int x1, int n1, int x2, int n2)
    {
        double theta = (double)n2 / n1;
        double p1 = (double)x1 / n1;
        double p2 = (double)x2 / n2;
        double a = 1 + theta;
        double b = -(1 + theta + p1 + theta * p2 + delta * (theta + 2));
        double c = delta * delta + delta * (2 * p1 + theta + 1) + p1 + theta * p2;
        double d = -p1 * delta * (1 + delta);
        double v = b * b * b / (27 * a * a * a) - b * c / (6 * a * a) + d / (2 * a);
        double uSquared = b * b / (9 * a * a) - c / (3 * a);
        double u = Math.Sign(v) * Math.Sqrt(Math.Max(0, uSquared));
        double r1;
        if (u == 0)
        {
            r1 = -b / (3 * a);
        }
        else
        {
            double cosine = Math.Clamp(v / (u * u * u), -1, 1);
            double w = (Math.PI + Math.Acos(cosine)) / 3;
            r1 = 2 * u * Math.Cos(w) - b / (3 * a);
        }
        r1 = Math.Clamp(r1, Math.Max(0, delta), Math.Min(1, 1 + delta));
        double r2 = Math.Clamp(r1 - delta, 0, 1);
        return (r1, r2);
    }
}
