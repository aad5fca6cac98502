namespace OutputForge.Stats.Models;

/// <summary>
/// The records of a repeated-measures analysis: one response per subject and visit (only observed
/// responses; a missing visit is simply absent), the subject of each record, the visit as a class
/// covariate whose levels are the positions of the covariance matrix in time order, and the other
/// class and numeric covariates the model terms may name.
/// </summary>
public sealed record MmrmData(
    IReadOnlyList<double> Response,
    IReadOnlyList<string> Subject,
    LinearModelFactor Visit,
    IReadOnlyList<LinearModelFactor> Factors,
    IReadOnlyList<LinearModelCovariate> Covariates)
{
    public int RecordCount => Response.Count;

    /// <summary>The class covariate of that name: the visit or one of <see cref="Factors"/>.</summary>
    public LinearModelFactor FactorNamed(string name) =>
        string.Equals(Visit.Name, name, StringComparison.Ordinal)
            ? Visit
            : Factors.FirstOrDefault(f => string.Equals(f.Name, name, StringComparison.Ordinal))
              ?? throw new ArgumentException($"the model names class covariate '{name}', which is not in the data", nameof(name));

    public LinearModelCovariate CovariateNamed(string name) =>
        Covariates.FirstOrDefault(c => string.Equals(c.Name, name, StringComparison.Ordinal))
        ?? throw new ArgumentException($"the model names numeric covariate '{name}', which is not in the data", nameof(name));
}
