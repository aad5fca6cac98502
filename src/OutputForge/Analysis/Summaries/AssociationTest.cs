using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// The test of a levels x arms table that a spec names (chi-square, likelihood-ratio or Fisher), with its
/// warnings as notes about <c>what</c> (the block or variable tested): for the chi-square tests Cochran's (1954)
/// caution when expected counts fall below 5, the test's own remarks (empty rows or columns left out), and a test
/// that gave no result.
/// </summary>
public static class AssociationTest
{
    /// <param name="monteCarlo">Fisher's exact test's fallback beyond exact enumeration (<see cref="ExactTestFallback"/>); null: NE.</param>
    public static (TestResult Test, List<ResultNote> Warnings) Run(SummaryTest choice, int[,] table, string what, Stats.Exact.FisherMonteCarloSettings? monteCarlo = null)
    {
        var warnings = new List<ResultNote>();
        var subject = new NoteSubject(What: what);
        TestResult test;
        if (choice == SummaryTest.Fisher)
        {
            test = FisherExactTest.Compute(table, monteCarlo);
        }
        else
        {
            test = choice == SummaryTest.LikelihoodRatio ? LikelihoodRatioChiSquareTest.Compute(table) : PearsonChiSquareTest.Compute(table);
            var expected = ContingencyTable.Diagnose(WithoutEmptyLines(table));
            if (test.IsEstimable && expected.CellsBelowFive > 0)
            {
                warnings.Add(ResultNote.Warning(NoteKind.SmallExpectedCounts, subject,
                    ("below", expected.CellsBelowFive), ("cells", expected.CellCount), ("smallest", expected.MinimumExpected)));
            }
        }
        warnings.AddRange(test.Notes.Select(n => ResultNote.Warning(NoteKind.MethodRemark, subject, ("text", n))));
        if (!test.IsEstimable)
        {
            warnings.Add(ResultNote.Warning(NoteKind.TestNotEstimable, subject, ("method", test.Method), ("reason", test.NotEstimableReason!)));
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
