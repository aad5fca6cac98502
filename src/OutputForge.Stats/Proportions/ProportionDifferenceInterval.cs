namespace OutputForge.Stats.Proportions;

/// <summary>
/// Two-sided confidence intervals for the difference of two independent proportions,
/// d = p1 - p2 with p1 = events1 / n1 (group 1) and p2 = events2 / n2 (group 2).
/// <list type="bullet">
/// <item>Wald: d -/+ z sqrt(p1 q1 / n1 + p2 q2 / n2) (Newcombe 1998, Stat Med 17:873-890, method 1).</item>
/// <item>Wald with continuity correction: the Wald half-width plus (1/n1 + 1/n2)/2 (Fleiss 1981,
/// Statistical Methods for Rates and Proportions; Newcombe 1998 method 2).</item>
/// <item>Newcombe hybrid score: Newcombe (1998) method 10, from the Wilson intervals (l_i, u_i)
/// without correction: L = d - sqrt((p1 - l1)^2 + (u2 - p2)^2), U = d + sqrt((u1 - p1)^2 + (p2 - l2)^2).</item>
/// <item>Agresti-Caffo: Agresti and Caffo (2000), Am Stat 54:280-288: the Wald interval after adding one
/// success and one failure to each group; the reported estimate stays the observed p1 - p2.</item>
/// <item>Miettinen-Nurminen score: Miettinen and Nurminen (1985), Stat Med 4:213-226, the inverted
/// score test with the N/(N - 1) variance factor (Newcombe 1998 method 6).</item>
/// </list>
/// The Wald, corrected Wald and Agresti-Caffo limits can fall outside [-1, 1]; they are truncated to
/// [-1, 1] and the truncation is reported in <see cref="IntervalResult.Notes"/>. Zero cells and arms at
/// 0% or 100% give defined intervals for every method (Wald then has zero width, a known aberration
/// of that method which is reported as a note).
/// </summary>
public static class ProportionDifferenceInterval
{
    public static IntervalResult Compute(int events1, int n1, int events2, int n2, DifferenceCiMethod method, double level = 0.95)
    {
        ValidateArm(events1, n1, 1);
        ValidateArm(events2, n2, 2);
        ConfidenceLevel.Validate(level);
        if (n1 == 0 || n2 == 0)
        {
            return IntervalResult.NotEstimable(n1 == 0 && n2 == 0 ? "no subjects in either group" : $"no subjects in group {(n1 == 0 ? 1 : 2)}");
        }

        double p1 = (double)events1 / n1;
        double p2 = (double)events2 / n2;
        double difference = p1 - p2;
        double z = ConfidenceLevel.NormalQuantile(level);
        switch (method)
        {
            case DifferenceCiMethod.Wald:
            {
                double half = z * Math.Sqrt(p1 * (1 - p1) / n1 + p2 * (1 - p2) / n2);
                return Truncated(difference, difference - half, difference + half, "Wald", half == 0);
            }
            case DifferenceCiMethod.WaldCorrected:
            {
                double half = z * Math.Sqrt(p1 * (1 - p1) / n1 + p2 * (1 - p2) / n2) + 0.5 * (1.0 / n1 + 1.0 / n2);
                return Truncated(difference, difference - half, difference + half, "Continuity-corrected Wald", false);
            }
            case DifferenceCiMethod.Newcombe:
            {
                var (l1, u1) = WilsonScoreBounds.Uncorrected(events1, n1, z);
                var (l2, u2) = WilsonScoreBounds.Uncorrected(events2, n2, z);
                double lower = difference - Math.Sqrt((p1 - l1) * (p1 - l1) + (u2 - p2) * (u2 - p2));
                double upper = difference + Math.Sqrt((u1 - p1) * (u1 - p1) + (p2 - l2) * (p2 - l2));
                return new IntervalResult(difference, Math.Max(-1, lower), Math.Min(1, upper));
            }
            case DifferenceCiMethod.AgrestiCaffo:
            {
                double a1 = (events1 + 1.0) / (n1 + 2);
                double a2 = (events2 + 1.0) / (n2 + 2);
                double centre = a1 - a2;
                double half = z * Math.Sqrt(a1 * (1 - a1) / (n1 + 2) + a2 * (1 - a2) / (n2 + 2));
                return Truncated(difference, centre - half, centre + half, "Agresti-Caffo", false);
            }
            case DifferenceCiMethod.MiettinenNurminen:
            {
                var (lower, upper) = MiettinenNurminenScore.Interval(events1, n1, events2, n2, z);
                return new IntervalResult(difference, lower, upper);
            }
            default:
                throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown confidence interval method for a difference of proportions.");
        }
    }

    private static void ValidateArm(int events, int n, int group)
    {
        if (n < 0)
        {
            throw new ArgumentOutOfRangeException(group == 1 ? "n1" : "n2", n, $"The number of subjects in group {group} cannot be negative.");
        }
        if (events < 0 || events > n)
        {
            throw new ArgumentOutOfRangeException(group == 1 ? "events1" : "events2", events, $"The number of events in group {group} must lie between 0 and {n}.");
        }
    }

    private static IntervalResult Truncated(double estimate, double lower, double upper, string methodName, bool zeroWidth)
    {
        var notes = new List<string>();
        if (zeroWidth)
        {
            notes.Add($"{methodName} interval has zero width because both proportions are 0 or 1.");
        }
        if (lower < -1)
        {
            notes.Add(FormattableString.Invariant($"{methodName} lower limit {lower:0.####} truncated to -1."));
            lower = -1;
        }
        if (upper > 1)
        {
            notes.Add(FormattableString.Invariant($"{methodName} upper limit {upper:0.####} truncated to 1."));
            upper = 1;
        }
        return new IntervalResult(estimate, lower, upper) { Notes = notes };
    }
}
