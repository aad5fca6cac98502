using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Spec;

namespace OutputForge.Kinds.Disposition;

/// <summary>
/// The "disposition" kind: blocks of n (%) per arm, each a categorical ADSL variable (completion
/// status, reason for discontinuation), optionally restricted to some subjects, with an optional
/// overall test across the arms.
/// </summary>
public sealed class DispositionSettings
{
    public required List<DispositionBlockSpec> Blocks { get; init; }

    /// <summary>Whether to show a Total column; the study's treatment.total when absent.</summary>
    public bool? Total { get; init; }

    public PercentDisplaySpec Percent { get; init; } = new();

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = MethodCatalog.PValueFloor.Default;
}

public sealed class DispositionBlockSpec
{
    /// <summary>The ADSL variable counted, e.g. EOSSTT or DCSREAS.</summary>
    public required string Variable { get; init; }

    /// <summary>Label of the block's heading row.</summary>
    public required string Label { get; init; }

    /// <summary>Results key of the block; the variable name when absent.</summary>
    public string? Key { get; init; }

    /// <summary>Condition on ADSL: only these subjects are counted (percentages stay of the column N).</summary>
    public string? Where { get; init; }

    /// <summary>Levels in display order; other values found in the data follow, with a warning.</summary>
    public List<LevelSpec>? Levels { get; init; }

    /// <summary>A numeric ADSL variable giving the levels' order (e.g. DCSREASN).</summary>
    public string? OrderBy { get; init; }

    /// <summary>Alphabetical or by frequency (descending), when neither levels nor orderBy is given.</summary>
    public LevelSorting Order { get; init; } = MethodCatalog.LevelSorting.DefaultValue;

    /// <summary>Whether to add a row counting subjects with no value.</summary>
    public bool Missing { get; init; }

    /// <summary>None, chi-square, likelihood-ratio or Fisher: test of the block's levels x arms table.</summary>
    public SummaryTest Test { get; init; } = MethodCatalog.CategoricalTest.DefaultValue;
}
