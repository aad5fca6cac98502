namespace OutputForge.Pipeline;

/// <summary>What a run produced: the files written (full paths), the number of tables and of warnings.</summary>
public sealed record RunSummary(IReadOnlyList<string> Files, int TableCount, int WarningCount, TimeSpan Elapsed);
