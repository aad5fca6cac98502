namespace OutputForge.Spec;

/// <summary>One level of a categorical variable: its value in the data and, optionally, its display label.</summary>
public sealed class LevelSpec
{
    public required string Value { get; init; }
    public string? Label { get; init; }
}
