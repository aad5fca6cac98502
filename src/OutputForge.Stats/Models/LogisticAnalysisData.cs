namespace OutputForge.Stats.Models;

/// <summary>
/// The records of a covariate-adjusted logistic regression: a 0/1 response per subject, the treatment as a class
/// covariate whose first level is the control, and the other class and numeric covariates (e.g. the randomization
/// strata and a baseline value).
/// </summary>
public sealed record LogisticAnalysisData(
    IReadOnlyList<int> Response,
    LinearModelFactor Treatment,
    IReadOnlyList<LinearModelFactor> Factors,
    IReadOnlyList<LinearModelCovariate> Covariates)
{
    public int Count => Response.Count;
}
