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

    /// <summary>"row-mean-scores" (default), "correlation", "general-association" or "none".</summary>
    public string Test { get; init; } = "row-mean-scores";

    /// <summary>
    /// Column scores: "table" (the category values, or each category's score), "equal-spacing" (1, 2, ... in
    /// listed order) or "modified-ridit" (standardized midranks computed within each stratum).
    /// </summary>
    public string Scores { get; init; } = "table";

    /// <summary>Stratification variables (endpoint record, else ADSL), cross-classified; none for an unstratified test.</summary>
    public List<string> Strata { get; init; } = [];

    /// <summary>"each-vs-control" (each active arm with the control, two arms per test) or "all-arms" (one test over every arm).</summary>
    public string Comparison { get; init; } = "each-vs-control";
}

/// <summary>One response category: its value in the data (a number for AVAL, text for AVALC), label and optional score.</summary>
public sealed class CategorySpec
{
    public required JsonElement Value { get; init; }
    public string? Label { get; init; }

    /// <summary>Score of the category for the "table" scores; the numeric value when absent.</summary>
    public double? Score { get; init; }
}
