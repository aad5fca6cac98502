namespace OutputForge.Stats.Stratified;

/// <summary>
/// The three generalized Cochran-Mantel-Haenszel statistics of an I x J x K table: nonzero
/// correlation (df 1), row mean scores differ (df I - 1) and general association (df (I - 1)(J - 1)).
/// The strata skipped (fewer than two subjects) are in each statistic's <see cref="TestResult.StratumRemarks"/>.
/// </summary>
public sealed record GeneralizedCmhResult(TestResult NonzeroCorrelation, TestResult RowMeanScores, TestResult GeneralAssociation);
