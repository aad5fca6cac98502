using OutputForge.Rendering;

namespace OutputForge.Pipeline;

/// <summary>What to run: the spec (study file or folder), the data folder (null: the study file's own), the output folder and formats.</summary>
public sealed record RunRequest(string SpecPath, string? DataFolder, string OutputFolder, IReadOnlyList<ITableRenderer> Renderers)
{
    /// <summary>The run time printed in outputs; null means now.</summary>
    public DateTimeOffset? RunTime { get; init; }

    /// <summary>Folders outside the spec's own folder tree that the spec may read from.</summary>
    public IReadOnlyList<string> AllowedFolders { get; init; } = [];

    /// <summary>How datasets are read (e.g. what to do with control characters).</summary>
    public Data.DataReadOptions DataOptions { get; init; } = Data.DataReadOptions.Default;

    /// <summary>Also write all tables in one .docx (with contents) and one .xlsx (with a results sheet), for the formats requested.</summary>
    public bool Combined { get; init; }

    /// <summary>The command line as given (recorded in manifest.json).</summary>
    public IReadOnlyList<string> CommandLine { get; init; } = [];

    /// <summary>
    /// Read every dataset of the study whole, instead of only the datasets and variables the selected tables use
    /// (<see cref="RunColumns"/>); the results are the same (a test compares them), only time and memory differ.
    /// </summary>
    public bool ReadEveryColumn { get; init; }

    /// <summary>Table ids or patterns to produce ("14.2.*"); null means every table of the package.</summary>
    public IReadOnlyList<string>? Tables { get; init; }

    /// <summary>The options that decide what the run reads (the same ones `check` takes).</summary>
    public PackageInputOptions Inputs => new() { AllowedFolders = AllowedFolders, DataOptions = DataOptions, Tables = Tables };
}
