namespace OutputForge.Workflow.Changes;

/// <summary>A number of a table whose value or display differs between two runs (old -> new).</summary>
public sealed record NumberChange(RunRecord Before, RunRecord After);
