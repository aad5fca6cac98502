using OutputForge.Spec;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// What a forest plot shows: one row per printed row of the subgroup table (the overall row, each
/// subgroup variable's heading, each level), each with the effect of every active arm against the
/// control; the measure (its label, scale and line of no effect) and the arms, for the axis text.
/// </summary>
internal sealed record ForestPlot(string TableId, IReadOnlyList<ForestPlotRow> Rows, IReadOnlyList<string> ActiveArms, string ControlArm,
    SubgroupMeasure Measure, string LevelText);

/// <summary>A row of the plot; <paramref name="Effects"/> is null for a heading (a subgroup variable's label).</summary>
internal sealed record ForestPlotRow(string Label, int Indent, IReadOnlyList<Stats.IntervalResult>? Effects);
