using System.Globalization;
using System.Security.Cryptography;
using OutputForge.Layout;
using OutputForge.Spec;
using OutputForge.Pipeline.Manifest;
using OutputForge.Common;

namespace OutputForge.Pipeline;

/// <summary>
/// The kept tables of a run with --tables and --combined. The combined files must hold every table of the folder,
/// but a kept table's own files were made by an earlier run; that table is rebuilt from the current specs and data
/// with the earlier run's time (from manifest.json), and used only when each of its rebuilt files has the same
/// bytes as the file kept in the folder: then the combined files show exactly what the folder holds. When one
/// differs (its spec, its data or the tool changed since), the run stops and names it, and nothing is written.
/// </summary>
public static class KeptTablesForCombined
{
    /// <param name="build">Builds one table with the given run facts: its layout and its files' names and bytes.</param>
    public static IReadOnlyList<LaidOutTable> Rebuild(IReadOnlyList<TableSpec> kept, string outputFolder, RunFacts run,
        Func<TableSpec, RunFacts, (LaidOutTable Table, IReadOnlyList<(string Name, byte[] Bytes)> Files)> build)
    {
        var manifest = File.Exists(Path.Combine(outputFolder, ManifestJson.FileName)) ? ManifestJson.Read(outputFolder) : null;
        var rebuilt = new LaidOutTable[kept.Count];
        var refused = new string?[kept.Count];
        InOrderParallel.For(kept.Count, i =>
        {
            var table = kept[i];
            var entry = manifest?.Tables.FirstOrDefault(t => t.Id == table.Id);
            if (entry is null || !DateTimeOffset.TryParse(entry.RunTime, CultureInfo.InvariantCulture,
                    DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal, out var keptTime))
            {
                refused[i] = $"table {table.Id} has no entry in {ManifestJson.FileName} of {outputFolder}";
                return;
            }
            var (laidOut, files) = build(table, run with { RunTime = keptTime });
            var differing = files.Where(f => !SameBytes(Path.Combine(outputFolder, f.Name), f.Bytes)).Select(f => f.Name).ToList();
            if (differing.Count > 0)
            {
                refused[i] = $"table {table.Id} comes out otherwise than its kept {string.Join(", ", differing)} (its spec, data or the tool changed since it was made)";
                return;
            }
            rebuilt[i] = laidOut;
        });
        var problems = refused.Where(r => r is not null).ToList();
        if (problems.Count > 0)
        {
            throw new RunException($"--combined with --tables: the combined files must hold every table of the folder, but {problems[0]}" +
                                   (problems.Count > 1 ? $" (and {problems.Count - 1} more kept tables)" : string.Empty) +
                                   "; run every table (without --tables) to make the combined files");
        }
        return rebuilt;
    }

    private static bool SameBytes(string file, byte[] bytes) =>
        File.Exists(file) && SHA256.HashData(File.ReadAllBytes(file)).AsSpan().SequenceEqual(SHA256.HashData(bytes));
}
