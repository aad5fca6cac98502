using OutputForge.Common;

namespace OutputForge.Data;

/// <summary>Options of reading datasets.</summary>
public sealed record DataReadOptions(ControlCharacterPolicy ControlCharacters = ControlCharacterPolicy.Refuse)
{
    /// <summary>Folders besides the data folder that dataset files may lead into through symbolic links (--allow-folder and the spec's own tree).</summary>
    public IReadOnlyList<string> ReadableFolders { get; init; } = [];

    /// <summary>The datasets and variables to read (<see cref="ColumnProjection"/>); null reads every dataset whole.</summary>
    public ColumnProjection? Projection { get; init; }

    /// <summary>The test of which variables of <paramref name="dataset"/> to keep; null keeps them all.</summary>
    internal Func<string, bool>? KeepOf(string dataset) => ColumnProjection.KeepOf(Projection, dataset);

    public static readonly DataReadOptions Default = new();
}
