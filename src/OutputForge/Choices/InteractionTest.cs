namespace OutputForge.Choices;

/// <summary>The treatment-by-subgroup interaction test.</summary>
public enum InteractionTest
{
    LikelihoodRatio,
    BreslowDay,
    BreslowDayTarone,
}
