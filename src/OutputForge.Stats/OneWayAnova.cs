using MathNet.Numerics;

namespace OutputForge.Stats;

/// <summary>
/// One-way analysis of variance F test of equal group means (Fisher 1925, Statistical Methods for
/// Research Workers; Montgomery, Design and Analysis of Experiments, chapter 3):
/// F = [SSB / (k - 1)] / [SSW / (N - k)]. Sums of squares are computed from the values as the
/// decimals they were written as (exact sums, no cancellation), which is what NIST StRD's
/// higher-difficulty datasets (13 constant leading digits) require. The p-value is the upper tail
/// of the F distribution, I_x(df2/2, df1/2) with x = df2 / (df2 + df1 F), so small p-values keep their digits.
/// </summary>
public static class OneWayAnova
{
    public const string MethodName = "One-way ANOVA F test";

    /// <summary>Groups with no values are left out (with a note); at least two non-empty groups and N above k are needed.</summary>
    public static TestResult Test(IReadOnlyList<IReadOnlyList<double>> groups)
    {
        var notes = new List<string>();
        var kept = new List<IReadOnlyList<double>>();
        for (int i = 0; i < groups.Count; i++)
        {
            if (groups[i].Count == 0)
            {
                notes.Add($"Group {i + 1} has no values and was left out of the analysis of variance.");
            }
            else
            {
                kept.Add(groups[i]);
            }
        }
        if (kept.Count < 2)
        {
            return TestResult.NotEstimable(MethodName, "fewer than two groups have values") with { Notes = notes };
        }
        int total = kept.Sum(g => g.Count);
        if (total <= kept.Count)
        {
            return TestResult.NotEstimable(MethodName, "every group has a single value, so there is no within-group variation to test against") with { Notes = notes };
        }
        var table = Compute(kept);
        if (table.SumOfSquaresWithin == 0)
        {
            return TestResult.NotEstimable(MethodName, "the values do not vary within groups, so F is undefined") with { Notes = notes };
        }
        return table.ToTest(notes);
    }

    /// <summary>The ANOVA table of non-empty groups (each with at least one value, N above the number of groups).</summary>
    public static OneWayAnovaResult Compute(IReadOnlyList<IReadOnlyList<double>> groups)
    {
        if (groups.Count < 2 || groups.Any(g => g.Count == 0) || groups.Sum(g => g.Count) <= groups.Count)
        {
            throw new ArgumentException("At least two non-empty groups and more values than groups are needed.", nameof(groups));
        }
        if (groups.Any(g => g.Any(double.IsNaN)))
        {
            throw new ArgumentException("A group holds NaN; leave missing values out first.", nameof(groups));
        }
        var exact = groups.Select(ExactDecimal.TryConvert).ToList();
        var (between, within) = ExactSumsOfSquares(exact) ?? SumsOfSquares(groups);
        int k = groups.Count;
        int n = groups.Sum(g => g.Count);
        int df1 = k - 1;
        int df2 = n - k;
        double msb = between / df1;
        double msw = within / df2;
        double f = msb / msw;
        double p = within == 0 ? 0 : SpecialFunctions.BetaRegularized(df2 / 2.0, df1 / 2.0, df2 / (df2 + df1 * f));
        return new OneWayAnovaResult(between, within, df1, df2, msb, msw, f, p, between / (between + within), Math.Sqrt(msw));
    }

    private static (double Between, double Within)? ExactSumsOfSquares(List<decimal[]?> groups)
    {
        if (groups.Any(g => g is null))
        {
            return null;
        }
        try
        {
            return SumsOfSquares(groups.Select(g => g!).ToList());
        }
        catch (OverflowException)
        {
            // Squares beyond the decimal range: the double computation is then the better one.
            return null;
        }
    }

    private static (double Between, double Within) SumsOfSquares(List<decimal[]> groups)
    {
        decimal grand = groups.Sum(g => g.Sum()) / groups.Sum(g => g.Length);
        decimal between = 0m, within = 0m;
        foreach (var group in groups)
        {
            decimal mean = group.Sum() / group.Length;
            between += group.Length * (mean - grand) * (mean - grand);
            foreach (var value in group)
            {
                within += (value - mean) * (value - mean);
            }
        }
        return ((double)between, (double)within);
    }

    private static (double Between, double Within) SumsOfSquares(IReadOnlyList<IReadOnlyList<double>> groups)
    {
        double grand = groups.Sum(g => g.Sum()) / groups.Sum(g => g.Count);
        double between = 0, within = 0;
        foreach (var group in groups)
        {
            double mean = group.Average();
            between += group.Count * (mean - grand) * (mean - grand);
            within += group.Sum(v => (v - mean) * (v - mean));
        }
        return (between, within);
    }
}
