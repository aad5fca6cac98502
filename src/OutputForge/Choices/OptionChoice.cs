namespace OutputForge.Choices;

/// <summary>One choice of an option: its name in specs and on the command line, its typed value, and how footnotes and docs describe it.</summary>
public sealed record OptionChoice<T>(string Name, T Value, string Description) where T : struct, Enum;
