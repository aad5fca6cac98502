namespace OutputForge.Workflow.Changes;

/// <summary>Two runs side by side: which inputs changed and how each table changed.</summary>
/// <param name="InputsKnown">False when a run folder has no manifest.json (written before manifests existed).</param>
public sealed record RunChanges(string Before, string After, string BeforeRunTime, string AfterRunTime, bool InputsKnown,
    IReadOnlyList<InputChange> Inputs, IReadOnlyList<TableChange> Tables)
{
    public IEnumerable<InputChange> ChangedInputs => Inputs.Where(i => i.Status != ChangeStatus.Unchanged);
    public IEnumerable<TableChange> ChangedTables => Tables.Where(t => t.Status != ChangeStatus.Unchanged);
    public int ChangedNumbers => Tables.Sum(t => t.Numbers.Count);
}
