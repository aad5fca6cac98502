using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Spec;
using QuantileDefinition = MathNet.Numerics.Statistics.QuantileDefinition;

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

    /// <summary>Hyndman and Fan (1996) definition 2 (the default) or definition 7.</summary>
    public QuantileDefinition Quartiles { get; init; } = MethodCatalog.Quartiles.DefaultValue;

    /// <summary>Default decimals of each statistic for every continuous variable (overriding the data-precision rule).</summary>
    public StatisticDecimalsSpec? Decimals { get; init; }

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = MethodCatalog.PValueFloor.Default;
}

public sealed class DemographicVariableSpec
{
    public required string Variable { get; init; }

    public required DemographicVariableType Type { get; init; }

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

    /// <summary>Categorical: alphabetical or by frequency (descending), when neither levels nor orderBy is given.</summary>
    public LevelSorting Order { get; init; } = MethodCatalog.LevelSorting.DefaultValue;

    /// <summary>Whether to add a "Missing" row (categorical) or to show n of missing values (continuous).</summary>
    public bool Missing { get; init; }

    /// <summary>None, ANOVA (continuous), chi-square, likelihood-ratio or Fisher (categorical).</summary>
    public SummaryTest Test { get; init; } = MethodCatalog.SummaryTest.DefaultValue;
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
    public int? GeometricMean { get; init; }
    public int? Cv { get; init; }
}
