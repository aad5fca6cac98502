namespace OutputForge.Stats.Models;

/// <summary>
/// What to fit: the fixed-effect terms (an intercept is always included), the within-subject covariance
/// structure, and restricted or full maximum likelihood.
/// </summary>
public sealed record MmrmModel(
    IReadOnlyList<MmrmTerm> Terms,
    MmrmCovarianceStructure Structure,
    MmrmEstimationMethod Method = MmrmEstimationMethod.RestrictedMaximumLikelihood);
