using System.Globalization;
using OutputForge.Pipeline;

namespace OutputForge.Pipeline.Manifest;

/// <summary>
/// Writes manifest.json into a run's staging folder, last, after every other output, so that it
/// holds the digests of exactly the files that land with it.
/// </summary>
public static class ManifestStaging
{
    /// <param name="previous">The manifest already in the run folder when only some tables were rerun; its other entries are kept.</param>
    public static void Write(OutputStaging staging, RunRequest request, string dataFolder, string studyId, DateTimeOffset runTime, RunInputs inputs,
        IReadOnlyList<ManifestTable> tables, RunManifest? previous)
    {
        var staged = staging.Files.Where(f => f != ManifestJson.FileName)
            .Select(f => new ManifestFile(f, FileDigest.Sha256(Path.Combine(staging.Folder, f))))
            .ToList();
        var outputs = Merge(previous?.Outputs, staged, f => f.Name);
        var tableEntries = Merge(previous?.Tables, tables, t => t.Id);
        var manifest = new RunManifest("OutputForge", ToolVersion.Text, request.CommandLine, Timestamp(runTime), studyId,
            Path.GetFullPath(dataFolder), inputs.Specs, inputs.Data, outputs, tableEntries);
        using var stream = staging.Create(ManifestJson.FileName);
        ManifestJson.Write(stream, manifest);
    }

    public static string Timestamp(DateTimeOffset time) =>
        time.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture);

    /// <summary>Entries of this run replace the previous run's entries of the same key; the rest keep their order.</summary>
    private static IReadOnlyList<T> Merge<T>(IReadOnlyList<T>? previous, IReadOnlyList<T> current, Func<T, string> key)
    {
        if (previous is null)
        {
            return current;
        }
        var byKey = current.ToDictionary(key, StringComparer.Ordinal);
        var merged = previous.Select(p => byKey.Remove(key(p), out var replacement) ? replacement : p).ToList();
        merged.AddRange(current.Where(c => byKey.ContainsKey(key(c))));
        return merged;
    }
}
