using OutputForge.Rendering;

namespace OutputForge.Pipeline;

/// <summary>What to run: the spec (study file or folder), the data folder (null: the study file's own), the output folder and formats.</summary>
public sealed record RunRequest(string SpecPath, string? DataFolder, string OutputFolder, IReadOnlyList<ITableRenderer> Renderers)
{
    /// <summary>The run time printed in outputs; null means now.</summary>
    public DateTimeOffset? RunTime { get; init; }

    /// <summary>How datasets are read (e.g. what to do with control characters).</summary>
    public Data.DataReadOptions DataOptions { get; init; } = Data.DataReadOptions.Default;

    /// <summary>Also write all tables in one .docx (with contents) and one .xlsx (with a results sheet), for the formats requested.</summary>
    public bool Combined { get; init; }
}
