namespace OutputForge.Choices;

/// <summary>The test of a block of a summary table (demographics, disposition, adverse events): its levels (or values) across the arms.</summary>
public enum SummaryTest
{
    None,
    Anova,
    ChiSquare,
    LikelihoodRatio,
    Fisher,
}
