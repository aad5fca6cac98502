namespace OutputForge.Workflow.Changes;

/// <summary>
/// How one table differs between two runs: every number that changed, the rows and columns (by
/// key) that appeared or disappeared, and single numbers that appeared or disappeared in rows and
/// columns present in both.
/// </summary>
public sealed record TableChange(
    string Id,
    ChangeStatus Status,
    IReadOnlyList<NumberChange> Numbers,
    IReadOnlyList<string> RowsAdded,
    IReadOnlyList<string> RowsRemoved,
    IReadOnlyList<string> ColumnsAdded,
    IReadOnlyList<string> ColumnsRemoved,
    IReadOnlyList<RunRecord> NumbersAdded,
    IReadOnlyList<RunRecord> NumbersRemoved);
