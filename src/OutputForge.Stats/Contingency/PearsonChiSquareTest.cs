using MathNet.Numerics;

namespace OutputForge.Stats.Contingency;

/// <summary>
/// Pearson's chi-square test of independence for an r x c table (Pearson 1900, Phil Mag 50:157-175;
/// Agresti 2013, Categorical Data Analysis 3rd ed., section 3.2): X^2 = sum (O - E)^2 / E with
/// E_ij = R_i C_j / n and (r - 1)(c - 1) degrees of freedom. The p-value is the upper tail of the
/// chi-square distribution, computed as the regularized upper incomplete gamma function Q(df/2, X^2/2)
/// so that very small p-values keep their digits.
/// Rows or columns with a zero total are dropped (and reported) when at least a 2 x 2 table remains;
/// otherwise the test is not estimable. Expected counts below 5 are reported in the notes.
/// </summary>
public static class PearsonChiSquareTest
{
    public const string MethodName = "Pearson's chi-square test";

    public static TestResult Compute(int[,] table) => ChiSquareTableTest.Compute(table, MethodName, Statistic);

    internal static double Statistic(int[,] table)
    {
        long[] rows = TableMargins.RowTotals(table);
        long[] columns = TableMargins.ColumnTotals(table);
        double n = rows.Sum();
        double sum = 0;
        for (int i = 0; i < rows.Length; i++)
        {
            for (int j = 0; j < columns.Length; j++)
            {
                double expected = rows[i] * (double)columns[j] / n;
                double deviation = table[i, j] - expected;
                sum += deviation * deviation / expected;
            }
        }
        return sum;
    }

    internal static string NotEstimableReason(int[,] original, int keptRows, int keptColumns)
    {
        if (original.GetLength(0) < 2 || original.GetLength(1) < 2)
        {
            return $"the table has {original.GetLength(0)} row(s) and {original.GetLength(1)} column(s); at least 2 x 2 is needed";
        }
        if (keptRows == 0 || keptColumns == 0)
        {
            return "the table has no observations";
        }
        return keptRows < 2
            ? "only one row has a non-zero total"
            : "only one column has a non-zero total";
    }
}
