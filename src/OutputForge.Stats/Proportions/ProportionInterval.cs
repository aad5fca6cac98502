using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.Proportions;

/// <summary>
/// Two-sided confidence intervals for a single binomial proportion p = events / n.
/// <list type="bullet">
/// <item>Wald: p -/+ z sqrt(p(1-p)/n) (Newcombe 1998, Stat Med 17:857-872, method 1).</item>
/// <item>Wilson score: Wilson (1927), JASA 22:209-212; closed form of Newcombe (1998) method 3.</item>
/// <item>Wilson score with continuity correction: Newcombe (1998) method 4.</item>
/// <item>Clopper-Pearson exact: Clopper and Pearson (1934), Biometrika 26:404-413, through the Beta
/// distribution: L = B(alpha/2; x, n-x+1), U = B(1-alpha/2; x+1, n-x).</item>
/// <item>Agresti-Coull: Agresti and Coull (1998), Am Stat 52:119-126: n~ = n + z^2,
/// p~ = (x + z^2/2)/n~, p~ -/+ z sqrt(p~(1-p~)/n~).</item>
/// <item>Jeffreys: Brown, Cai and DasGupta (2001), Stat Sci 16:101-133: quantiles alpha/2 and
/// 1-alpha/2 of Beta(x + 1/2, n - x + 1/2), with L = 0 when x = 0 and U = 1 when x = n.</item>
/// </list>
/// The Wald and Agresti-Coull limits can fall outside [0, 1]; they are truncated to [0, 1] and the
/// truncation is reported in <see cref="IntervalResult.Notes"/>. The other methods stay inside [0, 1]
/// by construction. The estimate is always events / n, whatever the method.
/// </summary>
public static class ProportionInterval
{
    public static IntervalResult Compute(int events, int n, ProportionCiMethod method, double level = 0.95)
    {
        if (n < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(n), n, "The number of subjects cannot be negative.");
        }
        if (events < 0 || events > n)
        {
            throw new ArgumentOutOfRangeException(nameof(events), events, $"The number of events must lie between 0 and n ({n}).");
        }
        ConfidenceLevel.Validate(level);
        if (n == 0)
        {
            return IntervalResult.NotEstimable("no subjects");
        }

        double estimate = (double)events / n;
        double z = ConfidenceLevel.NormalQuantile(level);
        double alpha = 1 - level;
        switch (method)
        {
            case ProportionCiMethod.Wald:
            {
                double half = z * Math.Sqrt(estimate * (1 - estimate) / n);
                return Truncated(estimate, estimate - half, estimate + half, "Wald");
            }
            case ProportionCiMethod.Wilson:
            {
                var (lower, upper) = WilsonScoreBounds.Uncorrected(events, n, z);
                return new IntervalResult(estimate, lower, upper);
            }
            case ProportionCiMethod.WilsonCorrected:
            {
                var (lower, upper) = WilsonScoreBounds.Corrected(events, n, z);
                return new IntervalResult(estimate, lower, upper);
            }
            case ProportionCiMethod.ClopperPearson:
            {
                double lower = events == 0 ? 0 : Beta.InvCDF(events, n - events + 1, alpha / 2);
                double upper = events == n ? 1 : Beta.InvCDF(events + 1, n - events, 1 - alpha / 2);
                return new IntervalResult(estimate, lower, upper);
            }
            case ProportionCiMethod.AgrestiCoull:
            {
                double z2 = z * z;
                double nTilde = n + z2;
                double pTilde = (events + z2 / 2) / nTilde;
                double half = z * Math.Sqrt(pTilde * (1 - pTilde) / nTilde);
                return Truncated(estimate, pTilde - half, pTilde + half, "Agresti-Coull");
            }
            case ProportionCiMethod.Jeffreys:
            {
                double lower = events == 0 ? 0 : Beta.InvCDF(events + 0.5, n - events + 0.5, alpha / 2);
                double upper = events == n ? 1 : Beta.InvCDF(events + 0.5, n - events + 0.5, 1 - alpha / 2);
                return new IntervalResult(estimate, lower, upper);
            }
            default:
                throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown confidence interval method for a proportion.");
        }
    }

    private static IntervalResult Truncated(double estimate, double lower, double upper, string methodName)
    {
        var notes = new List<string>();
        if (lower < 0)
        {
            notes.Add(FormattableString.Invariant($"{methodName} lower limit {lower:0.####} truncated to 0."));
            lower = 0;
        }
        if (upper > 1)
        {
            notes.Add(FormattableString.Invariant($"{methodName} upper limit {upper:0.####} truncated to 1."));
            upper = 1;
        }
        return new IntervalResult(estimate, lower, upper) { Notes = notes };
    }
}
