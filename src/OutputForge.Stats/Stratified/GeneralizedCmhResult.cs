namespace OutputForge.Stats.Stratified;

/// <summary>
/// The three generalized Cochran-Mantel-Haenszel statistics of an I x J x K table: nonzero
/// correlation (df 1), row mean scores differ (df I - 1) and general association (df (I - 1)(J - 1)).
/// </summary>
public sealed record GeneralizedCmhResult(TestResult NonzeroCorrelation, TestResult RowMeanScores, TestResult GeneralAssociation)
{
    /// <summary>Remarks that apply to all three (skipped strata).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
