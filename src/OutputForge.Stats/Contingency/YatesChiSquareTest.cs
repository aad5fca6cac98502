using MathNet.Numerics;

namespace OutputForge.Stats.Contingency;

/// <summary>
/// Pearson's chi-square test with Yates' continuity correction for a 2 x 2 table (Yates 1934,
/// J R Stat Soc Suppl 1:217-235): X^2 = sum over cells of max(0, |O - E| - 1/2)^2 / E, one degree
/// of freedom. The max(0, .) keeps the correction from overshooting when |O - E| is below 1/2; the same
/// rule is used by R's chisq.test (correct = TRUE) and scipy's chi2_contingency (correction = True).
/// A row or column with a zero total leaves less than a 2 x 2 table: the test is then not estimable.
/// Expected counts below 5 are reported in the notes.
/// </summary>
public static class YatesChiSquareTest
{
    public const string MethodName = "Pearson's chi-square test with Yates' continuity correction";

    public static TestResult TwoByTwo(int a, int b, int c, int d) => Compute(new[,] { { a, b }, { c, d } });

    public static TestResult Compute(int[,] table)
    {
        TableMargins.Validate(table);
        if (table.GetLength(0) != 2 || table.GetLength(1) != 2)
        {
            throw new ArgumentException($"Yates' continuity correction applies to 2 x 2 tables; this table is {table.GetLength(0)} x {table.GetLength(1)}.", nameof(table));
        }
        var (reduced, _) = TableMargins.DropEmptyLines(table);
        if (reduced.GetLength(0) < 2 || reduced.GetLength(1) < 2)
        {
            return TestResult.NotEstimable(MethodName, PearsonChiSquareTest.NotEstimableReason(table, reduced.GetLength(0), reduced.GetLength(1)));
        }
        long[] rows = TableMargins.RowTotals(table);
        long[] columns = TableMargins.ColumnTotals(table);
        double n = rows.Sum();
        double statistic = 0;
        for (int i = 0; i < 2; i++)
        {
            for (int j = 0; j < 2; j++)
            {
                double expected = rows[i] * (double)columns[j] / n;
                double corrected = Math.Max(0, Math.Abs(table[i, j] - expected) - 0.5);
                statistic += corrected * corrected / expected;
            }
        }
        double p = SpecialFunctions.GammaUpperRegularized(0.5, statistic / 2);
        var notes = SmallExpectedCountNote.For(table) is { } warning ? new List<string> { warning } : new List<string>();
        return new TestResult(MethodName, statistic, 1, p) { Notes = notes };
    }
}
