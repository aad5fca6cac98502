using OutputForge.Data;

namespace OutputForge.Pipeline;

/// <summary>The options that decide what a package reads, shared by `run` and `check` (which must read exactly what a run reads).</summary>
public sealed record PackageInputOptions
{
    public static readonly PackageInputOptions Default = new();

    /// <summary>Folders outside the spec's own folder tree that the spec may read from.</summary>
    public IReadOnlyList<string> AllowedFolders { get; init; } = [];

    /// <summary>How datasets are read (e.g. what to do with control characters).</summary>
    public DataReadOptions DataOptions { get; init; } = DataReadOptions.Default;

    /// <summary>Table ids or patterns ("14.2.*"); null means every table of the package.</summary>
    public IReadOnlyList<string>? Tables { get; init; }
}
