namespace OutputForge.Workflow.Changes;

/// <summary>The one-page text explanation of a regenerated package: changed inputs, then each table's changed numbers, then the unchanged tables.</summary>
public static class ChangesTextReport
{
    public static void Write(TextWriter output, RunChanges changes)
    {
        output.WriteLine("OutputForge changes");
        output.WriteLine($"before: {changes.Before} (run {changes.BeforeRunTime})");
        output.WriteLine($"after:  {changes.After} (run {changes.AfterRunTime})");
        output.WriteLine();
        if (!changes.InputsKnown)
        {
            output.WriteLine("Inputs: unknown (a run folder has no manifest.json)");
        }
        else
        {
            var changed = changes.ChangedInputs.ToList();
            output.WriteLine($"Inputs changed: {changed.Count} of {changes.Inputs.Count}");
            foreach (var input in changed)
            {
                output.WriteLine($"  {input.Kind} {input.Name}: {Describe(input)}");
            }
        }
        var tables = changes.ChangedTables.ToList();
        output.WriteLine();
        output.WriteLine($"Tables changed: {tables.Count} of {changes.Tables.Count}; numbers changed: {changes.ChangedNumbers}");
        foreach (var table in tables)
        {
            output.WriteLine($"  Table {table.Id}: {Describe(table)}");
            foreach (var (what, keys) in new[] { ("row added", table.RowsAdded), ("row removed", table.RowsRemoved), ("column added", table.ColumnsAdded), ("column removed", table.ColumnsRemoved) })
            {
                foreach (var key in keys)
                {
                    output.WriteLine($"    {what}: {key}");
                }
            }
            foreach (var number in table.Numbers)
            {
                output.WriteLine($"    {number.Before.Row} / {number.Before.Column} / {number.Before.Statistic} ({OneLine(number.Before.RowLabel)} / {OneLine(number.Before.ColumnLabel)}): {OneLine(number.Before.Formatted)} -> {OneLine(number.After.Formatted)}");
            }
            foreach (var number in table.NumbersAdded)
            {
                output.WriteLine($"    new: {number.Row} / {number.Column} / {number.Statistic} = {OneLine(number.Formatted)}");
            }
            foreach (var number in table.NumbersRemoved)
            {
                output.WriteLine($"    gone: {number.Row} / {number.Column} / {number.Statistic} (was {OneLine(number.Formatted)})");
            }
        }
        var unchanged = changes.Tables.Where(t => t.Status == ChangeStatus.Unchanged).Select(t => t.Id).ToList();
        output.WriteLine();
        output.WriteLine($"Tables unchanged: {unchanged.Count}{(unchanged.Count == 0 ? "" : ": " + string.Join(", ", unchanged))}");
    }

    /// <summary>A label of several lines (a column header "Placebo" over "(N=150)") on one line, so the report keeps one line per number.</summary>
    public static string OneLine(string text) =>
        string.Join(" ", text.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));

    public static string Describe(InputChange input) => input.Status switch
    {
        ChangeStatus.Changed => $"changed (SHA-256 {Short(input.BeforeSha256)} -> {Short(input.AfterSha256)}{Rows(input)})",
        ChangeStatus.Added => $"added (SHA-256 {Short(input.AfterSha256)})",
        ChangeStatus.Removed => $"removed (was SHA-256 {Short(input.BeforeSha256)})",
        _ => "unchanged",
    };

    public static string Describe(TableChange table) => table.Status switch
    {
        ChangeStatus.Added => "new table",
        ChangeStatus.Removed => "table no longer produced",
        ChangeStatus.Unchanged => "unchanged",
        _ => $"{table.Numbers.Count} number{(table.Numbers.Count == 1 ? "" : "s")} changed",
    };

    private static string Rows(InputChange input) =>
        input.BeforeRows is { } b && input.AfterRows is { } a ? $", rows {b} -> {a}" : string.Empty;

    private static string Short(string? sha) => sha is null ? "?" : Pipeline.Manifest.FileDigest.Short(sha);
}
