using OutputForge.Stats;

namespace OutputForge.Analysis;

/// <summary>The test of association a <see cref="TableTest"/> choice runs on an r x c table: one rule for tables and `calc`.</summary>
public static class TableTests
{
    /// <summary>
    /// Auto follows Cochran's rule (Cochran 1954; common practice): Pearson's chi-square unless an expected count is
    /// below 5, then Fisher's exact test.
    /// </summary>
    public static TestResult Compute(int[,] table, TableTest choice) => choice switch
    {
        TableTest.Fisher => FisherExactTest.Compute(table),
        TableTest.ChiSquare => PearsonChiSquareTest.Compute(table),
        TableTest.Yates => YatesChiSquareTest.Compute(table),
        TableTest.LikelihoodRatio => LikelihoodRatioChiSquareTest.Compute(table),
        _ => ContingencyTable.Diagnose(table).CellsBelowFive > 0 ? FisherExactTest.Compute(table) : PearsonChiSquareTest.Compute(table),
    };
}
