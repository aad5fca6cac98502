namespace OutputForge.Stats.Models;

/// <summary>
/// The covariance structure of the repeated measurements of one subject in a mixed model for
/// repeated measures (Jennrich and Schluchter, Biometrics 42, 1986). The parameters of each are
/// listed in docs/methods.md ("Mixed model for repeated measures").
/// </summary>
public enum MmrmCovarianceStructure
{
    /// <summary>Every variance and covariance free: T(T+1)/2 parameters.</summary>
    Unstructured,

    /// <summary>One variance, one common covariance (a between-subject and a within-subject component).</summary>
    CompoundSymmetry,

    /// <summary>A variance per visit and one common correlation.</summary>
    HeterogeneousCompoundSymmetry,

    /// <summary>One variance, correlation rho^|j-k| between visits j and k.</summary>
    Autoregressive1,

    /// <summary>A variance per visit, correlation rho^|j-k|.</summary>
    HeterogeneousAutoregressive1,

    /// <summary>A covariance per lag |j-k| (banded, stationary).</summary>
    Toeplitz,
}

/// <summary>The likelihood maximised: restricted (REML, Patterson and Thompson 1971) or full (ML).</summary>
public enum MmrmEstimationMethod
{
    RestrictedMaximumLikelihood,
    MaximumLikelihood,
}

/// <summary>
/// The denominator degrees of freedom of tests and intervals of fixed effects: Kenward and Roger
/// (1997), Satterthwaite (1946) with Fai and Cornelius (1996) for several numerator df, the residual
/// df N - rank(X), or the between-within partition (common practice; see docs/methods.md).
/// </summary>
public enum MmrmDegreesOfFreedom
{
    KenwardRoger,
    Satterthwaite,
    Residual,
    BetweenWithin,
}
