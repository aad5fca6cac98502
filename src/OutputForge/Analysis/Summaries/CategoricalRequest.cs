using OutputForge.Spec;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// What one categorical block counts: an ADSL variable, the subjects (an optional condition), how
/// its levels are ordered, whether missing values get a row. <paramref name="Pointer"/> is the JSON
/// pointer of the block in the table spec, for located errors.
/// </summary>
public sealed record CategoricalRequest(
    string Variable,
    string Key,
    string? Where,
    IReadOnlyList<LevelSpec>? Levels,
    string? OrderBy,
    LevelSorting Order,
    bool Missing,
    string Pointer);
