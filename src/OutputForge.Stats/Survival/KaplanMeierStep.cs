namespace OutputForge.Stats.Survival;

/// <summary>
/// The Kaplan-Meier curve at one distinct observed time: subjects at risk just before it, events and
/// censorings at it, the estimate S(t), the standard error of the cumulative hazard
/// sqrt(sum d/(n(n-d))) (Greenwood), and the pointwise log-log confidence limits (NaN where S is 0).
/// </summary>
public sealed record KaplanMeierStep(
    double Time,
    int AtRisk,
    int Events,
    int Censored,
    double Survival,
    double HazardStandardError,
    double Lower,
    double Upper)
{
    /// <summary>Greenwood's variance of S(t): S^2 sum d/(n(n-d)) (Greenwood 1926).</summary>
    public double GreenwoodVariance => Survival * Survival * HazardStandardError * HazardStandardError;
}
