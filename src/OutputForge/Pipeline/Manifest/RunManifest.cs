namespace OutputForge.Pipeline.Manifest;

/// <summary>
/// What one run read and wrote (manifest.json): the tool, the command line, when, every spec and
/// data file with its SHA-256 (and row count for data), every output with its SHA-256, and the
/// inputs of each table. Two manifests tell which inputs changed between runs.
/// </summary>
public sealed record RunManifest(
    string Tool,
    string Version,
    IReadOnlyList<string> CommandLine,
    string RunTime,
    string Study,
    string DataFolder,
    IReadOnlyList<ManifestFile> Specs,
    IReadOnlyList<ManifestFile> Data,
    IReadOnlyList<ManifestFile> Outputs,
    IReadOnlyList<ManifestTable> Tables);

/// <summary>
/// One file: <paramref name="Name"/> is relative to the study file's folder (specs), the data
/// folder (data) or the run folder (outputs); <paramref name="Dataset"/> and <paramref name="Rows"/> only for data.
/// </summary>
public sealed record ManifestFile(string Name, string Sha256, string? Dataset = null, int? Rows = null);

/// <summary>
/// The inputs one table used (its spec file and the data files of its datasets, each with its
/// digest as read for this table) and the files it was written to.
/// </summary>
/// <param name="RunTime">When the table was last produced (a run of some tables keeps the others' entries).</param>
public sealed record ManifestTable(string Id, IReadOnlyList<ManifestFile> Inputs, IReadOnlyList<string> Outputs, string RunTime);
