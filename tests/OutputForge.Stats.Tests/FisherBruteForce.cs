namespace OutputForge.Stats.Tests;

/// <summary>
/// Fisher's exact p-value by listing every table with the observed margins, cell by cell: the
/// definition itself (sum of P(table) over tables with P &lt;= P_obs (1 + 1e-7), P the multiple
/// hypergeometric probability), written without any of the network's shortcuts, for moderate n only.
/// </summary>
internal static class FisherBruteForce
{
    public static double PValue(int[,] table)
    {
        int r = table.GetLength(0);
        int c = table.GetLength(1);
        var rows = Enumerable.Range(0, r).Select(i => Enumerable.Range(0, c).Sum(j => table[i, j])).ToArray();
        var columns = Enumerable.Range(0, c).Select(j => Enumerable.Range(0, r).Sum(i => table[i, j])).ToArray();
        int n = rows.Sum();
        double constant = rows.Sum(LogFactorial) + columns.Sum(LogFactorial) - LogFactorial(n);
        double observed = constant - table.Cast<int>().Sum(LogFactorial);
        double limit = Math.Exp(observed) * (1 + 1e-7);
        var rowLeft = (int[])rows.Clone();
        var columnLeft = (int[])columns.Clone();
        double total = 0;
        Fill(0, 0, 0);
        return Math.Min(1, total);

        void Fill(int i, int j, double cellsLog)
        {
            if (i == r - 1)
            {
                // The last row is forced by the column totals still left.
                double last = cellsLog + columnLeft.Sum(LogFactorial);
                double probability = Math.Exp(constant - last);
                if (probability <= limit)
                {
                    total += probability;
                }
                return;
            }
            if (j == c - 1)
            {
                int forced = rowLeft[i];
                if (forced > columnLeft[j])
                {
                    return;
                }
                columnLeft[j] -= forced;
                rowLeft[i] = 0;
                Fill(i + 1, 0, cellsLog + LogFactorial(forced));
                columnLeft[j] += forced;
                rowLeft[i] = forced;
                return;
            }
            int highest = Math.Min(rowLeft[i], columnLeft[j]);
            for (int value = 0; value <= highest; value++)
            {
                rowLeft[i] -= value;
                columnLeft[j] -= value;
                Fill(i, j + 1, cellsLog + LogFactorial(value));
                rowLeft[i] += value;
                columnLeft[j] += value;
            }
        }
    }

    private static double LogFactorial(int k) => MathNet.Numerics.SpecialFunctions.FactorialLn(k);
}
