namespace OutputForge.Workflow.Changes;

public enum ChangeStatus { Unchanged, Changed, Added, Removed }

/// <summary>One spec or data file of two runs, compared by SHA-256 (and row count for data).</summary>
public sealed record InputChange(string Kind, string Name, ChangeStatus Status, string? BeforeSha256, string? AfterSha256,
    int? BeforeRows, int? AfterRows);
