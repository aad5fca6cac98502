namespace OutputForge.Stats.Exact;

/// <summary>
/// The conditional maximum-likelihood estimate of the odds ratio of group 1 to group 2 and its exact
/// conditional confidence interval (Cornfield 1956, Proc. Third Berkeley Symp. 4:135-148; Agresti
/// 2013, Categorical Data Analysis 3rd ed., section 16.6.4), the estimate and interval that go with
/// Fisher's exact test. Given both margins the first cell a = events1 follows the noncentral
/// hypergeometric distribution with parameter theta (<see cref="NoncentralHypergeometric"/>):
/// <list type="bullet">
/// <item>estimate: the theta with E(a; theta) = a (the conditional likelihood equation);</item>
/// <item>lower limit: the theta with P(a' &gt;= a; theta) = alpha/2; upper limit: the theta with
/// P(a' &lt;= a; theta) = alpha/2, for a two-sided level 1 - alpha.</item>
/// </list>
/// Each equation is monotone in log theta and solved by bisection to 1e-13 on the log scale.
/// Edges: when a is the smallest value its margins allow the estimate and the lower limit are 0;
/// when it is the largest the estimate and the upper limit are infinite (positive infinity, with a
/// note). A zero margin (an empty group, or no events or no non-events at all) admits only the
/// observed table, so nothing is estimable.
/// </summary>
public static class ExactConditionalOddsRatio
{
    public const string MethodName = "conditional maximum-likelihood odds ratio with exact conditional (Cornfield) confidence interval";

    private const double LogTolerance = 1e-13;

    public static IntervalResult Compute(int events1, int n1, int events2, int n2, double level = 0.95)
    {
        TwoGroupCounts.Validate(events1, n1, events2, n2);
        ConfidenceLevel.Validate(level);
        if (n1 == 0 || n2 == 0)
        {
            return IntervalResult.NotEstimable(TwoGroupCounts.EmptyGroupReason(n1, n2));
        }
        int events = events1 + events2;
        int nonEvents = n1 + n2 - events;
        if (events == 0 || nonEvents == 0)
        {
            return IntervalResult.NotEstimable(events == 0
                ? "no events in either group, so the odds ratio is not estimable"
                : "every subject has the event, so the odds ratio is not estimable");
        }
        var distribution = new NoncentralHypergeometric(n1, n2, events);
        double alpha = (1 - level) / 2;
        int a = events1;
        var notes = new List<string>();
        double estimate, lower, upper;
        if (a == distribution.Lowest)
        {
            estimate = 0;
            lower = 0;
            notes.Add("The estimate and the lower limit are 0 because the first cell is the smallest its margins allow.");
        }
        else
        {
            estimate = a == distribution.Highest ? double.PositiveInfinity : Math.Exp(Solve(logTheta => distribution.Mean(logTheta) - a));
            lower = Math.Exp(Solve(logTheta => distribution.AtLeast(a, logTheta) - alpha));
        }
        if (a == distribution.Highest)
        {
            estimate = double.PositiveInfinity;
            upper = double.PositiveInfinity;
            notes.Add("The estimate and the upper limit are infinite because the first cell is the largest its margins allow.");
        }
        else
        {
            upper = Math.Exp(Solve(logTheta => alpha - distribution.AtMost(a, logTheta)));
        }
        return new IntervalResult(estimate, lower, upper) { Notes = notes };
    }

    /// <summary>The root of an increasing function of log theta: a bracket is widened until it changes sign, then halved.</summary>
    private static double Solve(Func<double, double> increasing)
    {
        double low = -1;
        double high = 1;
        while (increasing(low) > 0)
        {
            high = low;
            low *= 2;
        }
        while (increasing(high) < 0)
        {
            low = high;
            high *= 2;
        }
        while (high - low > LogTolerance * Math.Max(1, Math.Abs(low)))
        {
            double mid = 0.5 * (low + high);
            if (increasing(mid) < 0)
            {
                low = mid;
            }
            else
            {
                high = mid;
            }
        }
        return 0.5 * (low + high);
    }
}
