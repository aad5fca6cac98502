namespace OutputForge.Layout;

/// <summary>Facts of one run that appear in every table's source line.</summary>
/// <param name="RunTime">When the run started (UTC).</param>
/// <param name="ToolVersion">OutputForge's version.</param>
/// <param name="DataFiles">Each dataset as the source line names it (file name and short digest), by dataset name.</param>
public sealed record RunFacts(DateTimeOffset RunTime, string ToolVersion, IReadOnlyDictionary<string, string> DataFiles)
{
    /// <summary>Short SHA-256 digest of each dataset's file, by dataset name (empty when not known).</summary>
    public IReadOnlyDictionary<string, string> DataDigests { get; init; } = new Dictionary<string, string>();
}
