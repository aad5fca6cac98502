using OutputForge.Pipeline.Manifest;

namespace OutputForge.Workflow.Changes;

/// <summary>
/// Compares two run folders (e.g. before and after database lock): input files by the digests of
/// their manifests, and tables number by number through the stable keys of results.json. A number
/// counts as changed when its full-precision value or its displayed text differs.
/// </summary>
internal static class RunComparison
{
    public static RunChanges Compare(string beforeFolder, string afterFolder)
    {
        var before = RunResults.Read(beforeFolder);
        var after = RunResults.Read(afterFolder);
        var beforeManifest = TryManifest(beforeFolder);
        var afterManifest = TryManifest(afterFolder);
        var inputs = beforeManifest is null || afterManifest is null
            ? []
            : Inputs("spec", beforeManifest.Specs, afterManifest.Specs).Concat(Inputs("data", beforeManifest.Data, afterManifest.Data)).ToList();
        var ids = before.Tables.Concat(after.Tables.Where(t => !before.Tables.Contains(t))).ToList();
        var tables = ids.Select(id => CompareTable(id,
            before.Tables.Contains(id) ? before.Records.Where(r => r.Table == id).ToList() : null,
            after.Tables.Contains(id) ? after.Records.Where(r => r.Table == id).ToList() : null)).ToList();
        return new RunChanges(before.File, after.File, before.RunTime, after.RunTime,
            beforeManifest is not null && afterManifest is not null, inputs, tables);
    }

    private static RunManifest? TryManifest(string folder) =>
        Directory.Exists(folder) && File.Exists(Path.Combine(folder, ManifestJson.FileName)) ? ManifestJson.Read(folder) : null;

    private static IEnumerable<InputChange> Inputs(string kind, IReadOnlyList<ManifestFile> before, IReadOnlyList<ManifestFile> after)
    {
        var afterByName = after.ToDictionary(f => f.Name, StringComparer.Ordinal);
        foreach (var old in before)
        {
            if (afterByName.Remove(old.Name, out var now))
            {
                var status = old.Sha256 == now.Sha256 ? ChangeStatus.Unchanged : ChangeStatus.Changed;
                yield return new InputChange(kind, old.Name, status, old.Sha256, now.Sha256, old.Rows, now.Rows);
            }
            else
            {
                yield return new InputChange(kind, old.Name, ChangeStatus.Removed, old.Sha256, null, old.Rows, null);
            }
        }
        foreach (var added in after.Where(f => afterByName.ContainsKey(f.Name)))
        {
            yield return new InputChange(kind, added.Name, ChangeStatus.Added, null, added.Sha256, null, added.Rows);
        }
    }

    private static TableChange CompareTable(string id, List<RunRecord>? before, List<RunRecord>? after)
    {
        if (before is null || after is null)
        {
            return new TableChange(id, before is null ? ChangeStatus.Added : ChangeStatus.Removed, [], [], [], [], [], [], []);
        }
        var rowsBefore = before.Select(r => r.Row).Distinct().ToList();
        var rowsAfter = after.Select(r => r.Row).Distinct().ToList();
        var columnsBefore = before.Select(r => r.Column).Distinct().ToList();
        var columnsAfter = after.Select(r => r.Column).Distinct().ToList();
        var rowsAdded = rowsAfter.Except(rowsBefore).ToList();
        var rowsRemoved = rowsBefore.Except(rowsAfter).ToList();
        var columnsAdded = columnsAfter.Except(columnsBefore).ToList();
        var columnsRemoved = columnsBefore.Except(columnsAfter).ToList();

        var afterByAddress = after.ToDictionary(r => r.Address, StringComparer.Ordinal);
        var numbers = new List<NumberChange>();
        var removed = new List<RunRecord>();
        foreach (var old in before)
        {
            if (!afterByAddress.Remove(old.Address, out var now))
            {
                removed.Add(old);
            }
            else if (!Equals(old.Value, now.Value) || old.Formatted != now.Formatted)
            {
                numbers.Add(new NumberChange(old, now));
            }
        }
        var added = after.Where(r => afterByAddress.ContainsKey(r.Address)).ToList();
        // Numbers of a whole row or column that appeared or disappeared are told by that row or column, not one by one.
        bool InWholeChange(RunRecord r, IReadOnlyList<string> rows, IReadOnlyList<string> columns) => rows.Contains(r.Row) || columns.Contains(r.Column);
        var changed = numbers.Count > 0 || added.Count > 0 || removed.Count > 0;
        return new TableChange(id, changed ? ChangeStatus.Changed : ChangeStatus.Unchanged, numbers,
            rowsAdded, rowsRemoved, columnsAdded, columnsRemoved,
            added.Where(r => !InWholeChange(r, rowsAdded, columnsAdded)).ToList(),
            removed.Where(r => !InWholeChange(r, rowsRemoved, columnsRemoved)).ToList());
    }
}
