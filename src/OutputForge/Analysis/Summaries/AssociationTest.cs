using System.Globalization;
using OutputForge.Stats;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// The test of a levels x arms table that a spec names (chi-square, likelihood-ratio or Fisher), with its
/// warnings: the test's own notes (empty rows or columns left out) and, for the chi-square tests, Cochran's
/// (1954) caution when expected counts fall below 5.
/// </summary>
public static class AssociationTest
{
    public static (TestResult Test, List<string> Warnings) Run(SummaryTest choice, int[,] table, string what)
    {
        var warnings = new List<string>();
        TestResult test;
        if (choice == SummaryTest.Fisher)
        {
            test = FisherExactTest.Compute(table);
        }
        else
        {
            test = choice == SummaryTest.LikelihoodRatio ? LikelihoodRatioChiSquareTest.Compute(table) : PearsonChiSquareTest.Compute(table);
            var expected = ContingencyTable.Diagnose(WithoutEmptyLines(table));
            if (test.IsEstimable && expected.CellsBelowFive > 0)
            {
                warnings.Add(string.Create(CultureInfo.InvariantCulture,
                    $"{what}: {expected.CellsBelowFive} of {expected.CellCount} expected counts are below 5 (smallest {expected.MinimumExpected:0.00}); the chi-square approximation may be poor."));
            }
        }
        warnings.AddRange(test.Notes.Select(n => $"{what}: {n}"));
        if (!test.IsEstimable)
        {
            warnings.Add($"{what}: {test.Method} not estimable: {test.NotEstimableReason}.");
        }
        return (test, warnings);
    }

    /// <summary>The table without zero-total rows and columns, as the tests themselves see it.</summary>
    private static int[,] WithoutEmptyLines(int[,] table)
    {
        var rows = Enumerable.Range(0, table.GetLength(0)).Where(i => Enumerable.Range(0, table.GetLength(1)).Any(j => table[i, j] > 0)).ToArray();
        var columns = Enumerable.Range(0, table.GetLength(1)).Where(j => Enumerable.Range(0, table.GetLength(0)).Any(i => table[i, j] > 0)).ToArray();
        var reduced = new int[rows.Length, columns.Length];
        for (var i = 0; i < rows.Length; i++)
        {
            for (var j = 0; j < columns.Length; j++)
            {
                reduced[i, j] = table[rows[i], columns[j]];
            }
        }
        return reduced;
    }
}
