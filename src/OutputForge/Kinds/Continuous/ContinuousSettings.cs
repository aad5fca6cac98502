namespace OutputForge.Kinds.Continuous;

/// <summary>
/// Settings of the "continuous" kind: a continuous endpoint by visit (baseline, value at the visit,
/// change from baseline) and, optionally, an ANCOVA of the change with LS means.
/// </summary>
public sealed class ContinuousSettings
{
    /// <summary>AVISIT values, one row block each, in display order.</summary>
    public required List<string> Visits { get; init; }

    public string Value { get; init; } = "AVAL";

    /// <summary>Baseline variable; null (JSON null) for an endpoint without a baseline, which drops the baseline block.</summary>
    public string? Baseline { get; init; } = "BASE";

    /// <summary>Change variable, the model's response; null drops the change block and the model analyses the value.</summary>
    public string? Change { get; init; } = "CHG";

    /// <summary>Decimals of the data as collected; means and medians get one more, SDs and SEs two more.</summary>
    public int Decimals { get; init; } = 1;

    /// <summary>The ANCOVA of change from baseline; none when absent.</summary>
    public ContinuousModelSettings? Model { get; init; }
}

/// <summary>The general linear model of change from baseline: treatment plus covariates from the spec.</summary>
public sealed class ContinuousModelSettings
{
    /// <summary>Numeric covariates (from the endpoint record, else ADSL), e.g. BASE.</summary>
    public List<string> Covariates { get; init; } = [];

    /// <summary>Class covariates (factors, from the endpoint record, else ADSL), e.g. STRAT1R.</summary>
    public List<string> Factors { get; init; } = [];

    /// <summary>Visits with the model; every visit of the table when absent.</summary>
    public List<string>? Visits { get; init; }

    /// <summary>Further comparisons as [arm, arm] pairs of treatment values: first minus second.</summary>
    public List<List<string>> Pairs { get; init; } = [];

    /// <summary>Numeric treatment variable of ADSL (e.g. TRT01PN) for a dose-response test; none when absent.</summary>
    public string? DoseVariable { get; init; }
}
