using OutputForge.Spec;

namespace OutputForge.Kinds.Populations;

/// <summary>
/// The "populations" kind: for each row (a population of the study spec, or a condition on ADSL),
/// n (%) of the table's population per arm. The table's population is the denominator.
/// </summary>
public sealed class PopulationsSettings
{
    public required List<PopulationRowSpec> Rows { get; init; }

    /// <summary>Whether to show a Total column; the study's treatment.total when absent.</summary>
    public bool? Total { get; init; }

    public PercentDisplaySpec Percent { get; init; } = new();
}

/// <summary>A row: either <see cref="Population"/>, or <see cref="Key"/> with <see cref="Where"/>.</summary>
public sealed class PopulationRowSpec
{
    /// <summary>A population name of the study spec.</summary>
    public string? Population { get; init; }

    /// <summary>The results key of a condition row.</summary>
    public string? Key { get; init; }

    /// <summary>Condition on ADSL, e.g. "COMP24FL = 'Y'".</summary>
    public string? Where { get; init; }

    /// <summary>Row label; the population's label when absent.</summary>
    public string? Label { get; init; }
}
