namespace OutputForge.Stats.Contingency;

/// <summary>
/// The likelihood-ratio chi-square test of independence for an r x c table (Agresti 2013,
/// Categorical Data Analysis 3rd ed., section 3.2.1; Wilks 1938): G^2 = 2 sum O ln(O / E) with
/// E_ij = R_i C_j / n and (r - 1)(c - 1) degrees of freedom; empty cells contribute 0 (the limit of
/// O ln O). The p-value is the chi-square upper tail Q(df/2, G^2/2). Zero-total rows and columns are
/// dropped and reported as for <see cref="PearsonChiSquareTest"/>, and so are expected counts below 5.
/// </summary>
public static class LikelihoodRatioChiSquareTest
{
    public const string MethodName = "Likelihood-ratio chi-square test";

    public static TestResult Compute(int[,] table) => ChiSquareTableTest.Compute(table, MethodName, Statistic);

    private static double Statistic(int[,] reduced)
    {
        int r = reduced.GetLength(0);
        int c = reduced.GetLength(1);
        long[] rows = TableMargins.RowTotals(reduced);
        long[] columns = TableMargins.ColumnTotals(reduced);
        double n = rows.Sum();
        double statistic = 0;
        for (int i = 0; i < r; i++)
        {
            for (int j = 0; j < c; j++)
            {
                if (reduced[i, j] > 0)
                {
                    double expected = rows[i] * (double)columns[j] / n;
                    statistic += 2 * reduced[i, j] * Math.Log(reduced[i, j] / expected);
                }
            }
        }
        return Math.Max(0, statistic);
    }
}
