using MathNet.Numerics;

namespace OutputForge.Stats.Contingency;

/// <summary>
/// What the large-sample tests of independence of an r x c table share around their statistic:
/// zero-total rows and columns dropped and reported (not estimable when less than a 2 x 2 table is
/// left), (r - 1)(c - 1) degrees of freedom, the chi-square upper tail Q(df/2, X/2) so that very small
/// p-values keep their digits, and the note on expected counts below 5.
/// </summary>
internal static class ChiSquareTableTest
{
    public static TestResult Compute(int[,] table, string method, Func<int[,], double> statistic)
    {
        TableMargins.Validate(table);
        var (reduced, notes) = TableMargins.DropEmptyLines(table);
        int r = reduced.GetLength(0);
        int c = reduced.GetLength(1);
        if (r < 2 || c < 2)
        {
            return TestResult.NotEstimable(method, PearsonChiSquareTest.NotEstimableReason(table, r, c));
        }
        double value = statistic(reduced);
        int df = (r - 1) * (c - 1);
        double p = SpecialFunctions.GammaUpperRegularized(df / 2.0, value / 2.0);
        if (SmallExpectedCountNote.For(reduced) is { } warning)
        {
            notes.Add(warning);
        }
        return new TestResult(method, value, df, p) { Notes = notes };
    }
}
