using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Spec;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// Settings of the "subgroups" kind: the responder analysis of the table's endpoint repeated within
/// each level of each subgroup variable, with a treatment effect per active arm and level, a
/// treatment-by-subgroup interaction test per variable, and a forest plot (docs/kinds-subgroups.md).
/// </summary>
public sealed class SubgroupSettings
{
    /// <summary>The ADSL variables that define the subgroups, in print order.</summary>
    public required List<SubgroupVariableSpec> Variables { get; init; }

    /// <summary>Difference (in proportions, interval from statistics.differenceInterval), odds ratio (Woolf) or relative risk (Katz).</summary>
    public EffectMeasure Measure { get; init; } = MethodCatalog.EffectMeasure.DefaultValue;

    /// <summary>Likelihood-ratio (logistic regression), Breslow-Day, or Breslow-Day with Tarone's correction.</summary>
    public InteractionTest Interaction { get; init; } = MethodCatalog.InteractionTest.DefaultValue;

    /// <summary>An effect is not estimated in a level where an arm compared has fewer subjects than this in the denominator.</summary>
    public int MinimumPerArm { get; init; } = 5;

    /// <summary>Decimals of odds ratios and relative risks (differences use statistics.percentDecimals).</summary>
    public int RatioDecimals { get; init; } = 2;

    /// <summary>Whether to draw the forest plot beside the table.</summary>
    public bool ForestPlot { get; init; } = true;
}

/// <summary>One subgroup variable: its ADSL name, the section label, and optionally its levels in print order.</summary>
public sealed class SubgroupVariableSpec
{
    public required string Variable { get; init; }
    public string? Label { get; init; }

    /// <summary>Levels and labels in print order; when absent, the values in the data, ordered as docs/kinds-subgroups.md says.</summary>
    public List<LevelSpec>? Levels { get; init; }
}
