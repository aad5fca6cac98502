namespace OutputForge.Data;

/// <summary>Options of reading datasets.</summary>
public sealed record DataReadOptions(ControlCharacterPolicy ControlCharacters = ControlCharacterPolicy.Refuse)
{
    /// <summary>Folders besides the data folder that dataset files may lead into through symbolic links (--allow-folder and the spec's own tree).</summary>
    public IReadOnlyList<string> ReadableFolders { get; init; } = [];

    public static readonly DataReadOptions Default = new();
}
