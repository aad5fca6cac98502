namespace OutputForge.Stats.Proportions;

/// <summary>
/// The relative risk RR = p1 / p2 of group 1 to group 2 with the log (Katz) confidence interval
/// (Katz, Baptista, Azen and Pike 1978, Biometrics 34:469-474):
/// exp(ln RR -/+ z sqrt(1/x1 - 1/n1 + 1/x2 - 1/n2)).
/// With no events in either group the ratio or its log variance is undefined: the result is not
/// estimable, unless <c>addHalfWhenZero</c> asks for the correction that adds 1/2 to every cell of
/// the 2 x 2 table (events and non-events of both groups, so each group size grows by 1; the Haldane
/// 1956 correction carried over to the risk ratio, common practice), which is then stated in the notes.
/// </summary>
public static class RelativeRisk
{
    public static IntervalResult Compute(int events1, int n1, int events2, int n2, double level = 0.95, bool addHalfWhenZero = false)
    {
        TwoGroupCounts.Validate(events1, n1, events2, n2);
        ConfidenceLevel.Validate(level);
        if (n1 == 0 || n2 == 0)
        {
            return IntervalResult.NotEstimable(TwoGroupCounts.EmptyGroupReason(n1, n2));
        }
        var notes = new List<string>();
        double x1 = events1, x2 = events2, m1 = n1, m2 = n2;
        if (events1 == 0 || events2 == 0)
        {
            if (!addHalfWhenZero)
            {
                return IntervalResult.NotEstimable(events1 == 0 && events2 == 0
                    ? "no events in either group"
                    : $"no events in group {(events1 == 0 ? 1 : 2)}, so the relative risk or its log variance is undefined");
            }
            x1 += 0.5; x2 += 0.5; m1 += 1; m2 += 1;
            notes.Add("0.5 was added to every cell because a group has no events.");
        }
        double logRatio = Math.Log(x1 / m1) - Math.Log(x2 / m2);
        double se = Math.Sqrt(Math.Max(0, 1 / x1 - 1 / m1 + 1 / x2 - 1 / m2));
        double z = ConfidenceLevel.NormalQuantile(level);
        if (se == 0)
        {
            notes.Add("Every subject in both groups had the event, so the interval has zero width.");
        }
        return new IntervalResult(Math.Exp(logRatio), Math.Exp(logRatio - z * se), Math.Exp(logRatio + z * se)) { Notes = notes };
    }
}
