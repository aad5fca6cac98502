using OutputForge.Analysis;
using OutputForge.Choices;
using System.Text.Json;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// Settings of the "categorical-by-visit" kind: the distribution of an ordinal or nominal response per
/// arm at each visit, with one generalized Cochran-Mantel-Haenszel p-value per visit.
/// </summary>
public sealed class CategoricalByVisitSettings
{
    /// <summary>AVISIT values in display order; every visit of the selected records, ordered by AVISITN, when absent.</summary>
    public List<string>? Visits { get; init; }

    /// <summary>The response variable: AVAL (numeric codes) or AVALC (text).</summary>
    public string Variable { get; init; } = "AVAL";

    /// <summary>The categories in display (and score) order; categories absent from the data are shown with 0.</summary>
    public required List<CategorySpec> Categories { get; init; }

    /// <summary>Whether each visit shows a row counting the subjects of the population without a response there.</summary>
    public bool MissingRow { get; init; } = true;

    /// <summary>
    /// Null: observed records only (DTYPE empty). A DTYPE value such as "LOCF": observed records plus the
    /// derived records of that type, which fill visits without an observed value.
    /// </summary>
    public string? Imputation { get; init; }

    /// <summary>Row mean scores (default), correlation, general association or none.</summary>
    public GeneralizedCmhStatistic Test { get; init; } = MethodCatalog.GeneralizedCmh.DefaultValue;

    /// <summary>
    /// Column scores: category values (each category's score, else its value), equal spacing (1, 2, ... in
    /// listed order) or modified ridits (standardized midranks computed within each stratum).
    /// </summary>
    public ColumnScores Scores { get; init; } = MethodCatalog.ColumnScores.DefaultValue;

    /// <summary>Stratification variables (endpoint record, else ADSL), cross-classified; none for an unstratified test.</summary>
    public List<string> Strata { get; init; } = [];

    /// <summary>Each active arm with the control (two arms per test), or one test over every arm.</summary>
    public ArmComparison Comparison { get; init; } = MethodCatalog.ArmComparison.DefaultValue;
}

/// <summary>One response category: its value in the data (a number for AVAL, text for AVALC), label and optional score.</summary>
public sealed class CategorySpec
{
    public required JsonElement Value { get; init; }
    public string? Label { get; init; }

    /// <summary>Score of the category for the category-values scores; the numeric value when absent.</summary>
    public double? Score { get; init; }
}
