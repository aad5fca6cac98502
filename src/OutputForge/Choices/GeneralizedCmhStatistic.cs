namespace OutputForge.Choices;

/// <summary>Which statistic of the generalized Cochran-Mantel-Haenszel family a categorical-by-visit table reports.</summary>
public enum GeneralizedCmhStatistic
{
    RowMeanScores,
    Correlation,
    GeneralAssociation,
    None,
}
