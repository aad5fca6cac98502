namespace OutputForge.Stats.Contingency;

/// <summary>
/// Expected-count diagnostics of an r x c table under independence, E_ij = R_i C_j / n (Cochran
/// 1954, Biometrics 10:417-451, whose rule of thumb asks for no expected count below 1 and at most
/// 20% of them below 5 before the chi-square approximation is trusted).
/// The table is taken as given: a row or column with a zero total contributes expected counts of 0.
/// An empty table (n = 0) reports a minimum of 0 and every cell below 5.
/// </summary>
public static class ContingencyTable
{
    public static ExpectedCountDiagnostics Diagnose(int[,] table)
    {
        TableMargins.Validate(table);
        long[] rows = TableMargins.RowTotals(table);
        long[] columns = TableMargins.ColumnTotals(table);
        long n = rows.Sum();
        int cellCount = rows.Length * columns.Length;
        if (cellCount == 0)
        {
            return new ExpectedCountDiagnostics(0, 0, 0);
        }
        if (n == 0)
        {
            return new ExpectedCountDiagnostics(0, cellCount, cellCount);
        }
        double minimum = double.PositiveInfinity;
        int belowFive = 0;
        foreach (long r in rows)
        {
            foreach (long c in columns)
            {
                double expected = (double)r * c / n;
                minimum = Math.Min(minimum, expected);
                if (expected < 5)
                {
                    belowFive++;
                }
            }
        }
        return new ExpectedCountDiagnostics(minimum, belowFive, cellCount);
    }
}
