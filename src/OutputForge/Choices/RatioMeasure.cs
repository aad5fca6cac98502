namespace OutputForge.Choices;

/// <summary>A ratio row of a responder table, each active arm against the control.</summary>
public enum RatioMeasure
{
    RelativeRisk,
    OddsRatio,
}
