namespace OutputForge.Choices;

/// <summary>The treatment effect of each subgroup level.</summary>
public enum EffectMeasure
{
    Difference,
    OddsRatio,
    RelativeRisk,
}
