namespace OutputForge.Stats.Models;

/// <summary>
/// An estimate c'b of a linear model with its standard error, t-based two-sided confidence
/// interval, t statistic and two-sided p-value on the model's residual degrees of freedom.
/// </summary>
public sealed record LinearContrastResult(
    double Estimate,
    double StandardError,
    double DegreesOfFreedom,
    double Lower,
    double Upper,
    double T,
    double PValue);
