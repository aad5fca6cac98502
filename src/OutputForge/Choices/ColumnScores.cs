namespace OutputForge.Choices;

/// <summary>The column (response category) scores of the generalized Cochran-Mantel-Haenszel statistics.</summary>
public enum ColumnScores
{
    CategoryValues,
    EqualSpacing,
    ModifiedRidit,
}
