namespace OutputForge.Choices;

/// <summary>What a time-to-event table prints at the chosen times.</summary>
public enum SurvivalEstimate
{
    EventFree,
    Event,
}
