namespace OutputForge.Stats.Proportions;

/// <summary>
/// The odds ratio OR = (x1 (n2 - x2)) / ((n1 - x1) x2) of group 1 to group 2 with the Woolf logit
/// confidence interval (Woolf 1955, Ann Hum Genet 19:251-253): exp(ln OR -/+ z sqrt(1/a + 1/b + 1/c + 1/d)).
/// Any zero cell makes the ratio or its variance undefined: the result is not estimable, unless
/// <c>addHalfWhenZero</c> asks for the Haldane (1956, Ann Hum Genet 20:309-311) correction of adding
/// 1/2 to every cell, which is then stated in the notes.
/// </summary>
public static class OddsRatio
{
    public static IntervalResult Compute(int events1, int n1, int events2, int n2, double level = 0.95, bool addHalfWhenZero = false)
    {
        TwoGroupCounts.Validate(events1, n1, events2, n2);
        ConfidenceLevel.Validate(level);
        if (n1 == 0 || n2 == 0)
        {
            return IntervalResult.NotEstimable(TwoGroupCounts.EmptyGroupReason(n1, n2));
        }
        double a = events1, b = n1 - events1, c = events2, d = n2 - events2;
        var notes = new List<string>();
        if (a == 0 || b == 0 || c == 0 || d == 0)
        {
            if (!addHalfWhenZero)
            {
                return IntervalResult.NotEstimable("a cell of the 2 x 2 table is zero, so the odds ratio or its log variance is undefined");
            }
            a += 0.5; b += 0.5; c += 0.5; d += 0.5;
            notes.Add("0.5 was added to every cell because a cell is zero.");
        }
        double logRatio = Math.Log(a) + Math.Log(d) - Math.Log(b) - Math.Log(c);
        double se = Math.Sqrt(1 / a + 1 / b + 1 / c + 1 / d);
        double z = ConfidenceLevel.NormalQuantile(level);
        return new IntervalResult(Math.Exp(logRatio), Math.Exp(logRatio - z * se), Math.Exp(logRatio + z * se)) { Notes = notes };
    }
}
