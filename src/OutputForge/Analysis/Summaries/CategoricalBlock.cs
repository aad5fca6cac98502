using OutputForge.Results;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// The counted rows of one categorical block and its levels x arms table of counts (Total and the
/// Missing row left out), ready for a test of association.
/// </summary>
public sealed record CategoricalBlock(IReadOnlyList<ResultRow> Rows, int[,] LevelsByArm, IReadOnlyList<string> Warnings);
