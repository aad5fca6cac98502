namespace OutputForge.Stats.Models;

/// <summary>
/// An estimate c'beta of a mixed model for repeated measures (a coefficient, an LS mean or a difference
/// of LS means) with its standard error, denominator degrees of freedom, two-sided t interval, t
/// statistic and two-sided p-value; or why it cannot be estimated. With Kenward-Roger the standard error
/// is from the adjusted covariance Phi_A.
/// </summary>
public sealed record MmrmContrastResult(
    double Estimate,
    double StandardError,
    double DegreesOfFreedom,
    double Lower,
    double Upper,
    double T,
    double PValue,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    public static MmrmContrastResult NotEstimable(string reason) => new(0, 0, 0, 0, 0, 0, 0, reason);
}

/// <summary>
/// An F test of a linear hypothesis L beta = 0 (a Type 3 test of a model term): numerator and
/// denominator degrees of freedom, the F statistic (Kenward-Roger: scaled by lambda) and its p-value;
/// or why it cannot be computed.
/// </summary>
public sealed record MmrmFTestResult(
    string Term,
    int NumeratorDegreesOfFreedom,
    double DenominatorDegreesOfFreedom,
    double F,
    double PValue,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    public static MmrmFTestResult NotEstimable(string term, int numeratorDf, string reason) => new(term, numeratorDf, 0, 0, 0, reason);
}
