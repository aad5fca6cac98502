using OutputForge.Spec;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// The "demographics" kind: one block per ADSL variable, continuous (n, mean, SD, median,
/// quartiles, range in the rows the spec lists) or categorical (n (%) per level), with an optional
/// p-value per variable.
/// </summary>
public sealed class DemographicsSettings
{
    public required List<DemographicVariableSpec> Variables { get; init; }

    /// <summary>Whether to show a Total column; the study's treatment.total when absent.</summary>
    public bool? Total { get; init; }

    public PercentDisplaySpec Percent { get; init; } = new();

    /// <summary>"hyndman-fan-2" (Hyndman and Fan 1996 definition 2) or "hyndman-fan-7" (definition 7, R's default).</summary>
    public string Quartiles { get; init; } = "hyndman-fan-2";

    /// <summary>Default decimals of each statistic for every continuous variable (overriding the data-precision rule).</summary>
    public StatisticDecimalsSpec? Decimals { get; init; }

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = 0.001;
}

public sealed class DemographicVariableSpec
{
    public required string Variable { get; init; }

    /// <summary>"continuous" or "categorical".</summary>
    public required string Type { get; init; }

    /// <summary>Label of the block's heading row; the variable name when absent.</summary>
    public string? Label { get; init; }

    /// <summary>Continuous: the rows, each a layout of statistics, e.g. "n", "mean (sd)", "median", "q1, q3", "min, max".</summary>
    public List<string>? Rows { get; init; }

    /// <summary>Continuous: decimals of the data; detected from the values as written when absent.</summary>
    public int? DataDecimals { get; init; }

    /// <summary>Continuous: decimals of single statistics, overriding the table's and the data-precision rule.</summary>
    public StatisticDecimalsSpec? Decimals { get; init; }

    /// <summary>Categorical: levels in display order; other values found in the data follow, with a warning.</summary>
    public List<LevelSpec>? Levels { get; init; }

    /// <summary>Categorical: a numeric ADSL variable giving the levels' order (e.g. AGEGR1N).</summary>
    public string? OrderBy { get; init; }

    /// <summary>Categorical: "alphabetical" or "frequency" (descending), when neither levels nor orderBy is given.</summary>
    public string Order { get; init; } = "alphabetical";

    /// <summary>Whether to add a "Missing" row (categorical) or to show n of missing values (continuous).</summary>
    public bool Missing { get; init; }

    /// <summary>"none", "anova" (continuous), "chi-square", "likelihood-ratio" or "fisher" (categorical).</summary>
    public string Test { get; init; } = "none";
}

/// <summary>Decimals of single descriptive statistics.</summary>
public sealed class StatisticDecimalsSpec
{
    public int? Mean { get; init; }
    public int? Sd { get; init; }
    public int? Median { get; init; }
    public int? Q1 { get; init; }
    public int? Q3 { get; init; }
    public int? Min { get; init; }
    public int? Max { get; init; }
    public int? Geomean { get; init; }
    public int? Cv { get; init; }
}
