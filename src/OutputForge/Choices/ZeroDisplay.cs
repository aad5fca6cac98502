namespace OutputForge.Choices;

/// <summary>How a zero count of an n (%) cell is shown.</summary>
public enum ZeroDisplay
{
    Count,
    CountPercent,
}
