using MathNet.Numerics;
using OutputForge.Stats.Descriptive;

namespace OutputForge.Stats.Models;

/// <summary>
/// One-way analysis of variance (Fisher 1925; any text, e.g. Montgomery, Design and Analysis of
/// Experiments, chapter 3): SS_within = sum over groups of sum (y - group mean)^2, SS_between =
/// sum n_g (group mean - grand mean)^2, df k - 1 and N - k, F = MS_between / MS_within, p from the
/// F distribution's upper tail (Abramowitz and Stegun 26.6.2). Sums are formed as in <see cref="CentralMoments"/>, so the NIST StRD
/// ANOVA data sets (SiRstv, SmLs01-09, AtmWtAg) are reproduced to their certified digits.
/// Empty groups are dropped and reported; fewer than two non-empty groups, or no within-group degrees
/// of freedom, make the table not estimable. A zero within-group sum of squares with a positive
/// between-group one gives no finite F: not estimable, with that reason.
/// </summary>
public static class OneWayAnova
{
    public static AnovaResult Compute(IReadOnlyList<IReadOnlyList<double>> groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var notes = new List<string>();
        var used = new List<IReadOnlyList<double>>();
        for (int g = 0; g < groups.Count; g++)
        {
            var values = groups[g] ?? throw new ArgumentException($"Group {g + 1} is null.", nameof(groups));
            if (values.Any(v => double.IsNaN(v) || double.IsInfinity(v)))
            {
                throw new ArgumentException($"Group {g + 1} contains a value that is not a finite number.", nameof(groups));
            }
            if (values.Count == 0)
            {
                notes.Add($"Group {g + 1} has no values and was left out.");
            }
            else
            {
                used.Add(values);
            }
        }
        int k = used.Count;
        int total = used.Sum(g => g.Count);
        if (k < 2)
        {
            return AnovaResult.NotEstimable("fewer than two groups have values") with { Notes = notes };
        }
        if (total - k < 1)
        {
            return AnovaResult.NotEstimable("no group has more than one value, so there is no within-group variation to test against") with { Notes = notes };
        }
        var (between, within) = SumsOfSquares(used);
        int dfBetween = k - 1;
        int dfWithin = total - k;
        double msBetween = between / dfBetween;
        double msWithin = within / dfWithin;
        if (msWithin == 0)
        {
            return AnovaResult.NotEstimable("every group is constant, so the within-group mean square is zero") with { Notes = notes };
        }
        double f = msBetween / msWithin;
        // Upper tail of F(d1, d2) as the regularized incomplete beta I_x(d2/2, d1/2), x = d2 / (d2 + d1 F),
        // which keeps small p-values accurate (Abramowitz and Stegun 26.6.2).
        double p = SpecialFunctions.BetaRegularized(dfWithin / 2.0, dfBetween / 2.0, dfWithin / (dfWithin + dfBetween * f));
        double rSquared = between + within == 0 ? 0 : between / (between + within);
        return new AnovaResult(dfBetween, dfWithin, between, within, msBetween, msWithin, f, p, rSquared, Math.Sqrt(msWithin)) { Notes = notes };
    }

    /// <summary>Between- and within-group sums of squares, in decimal arithmetic when every group allows it.</summary>
    private static (double Between, double Within) SumsOfSquares(List<IReadOnlyList<double>> groups)
    {
        var all = groups.SelectMany(g => g).ToArray();
        if (CentralMoments.TryExact(all, out decimal grand, out _))
        {
            decimal betweenExact = 0;
            decimal withinExact = 0;
            bool exact = true;
            foreach (var g in groups)
            {
                if (!CentralMoments.TryExact(g, out decimal mean, out decimal squares))
                {
                    exact = false;
                    break;
                }
                decimal shift = mean - grand;
                betweenExact += g.Count * shift * shift;
                withinExact += squares;
            }
            if (exact)
            {
                return ((double)betweenExact, (double)withinExact);
            }
        }
        var (grandMean, _) = CentralMoments.Compute(all);
        double between = 0;
        double within = 0;
        foreach (var g in groups)
        {
            var (mean, squares) = CentralMoments.Compute(g);
            within += squares;
            between += g.Count * (mean - grandMean) * (mean - grandMean);
        }
        return (between, within);
    }
}
