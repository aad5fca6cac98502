namespace OutputForge.Stats.Models;

/// <summary>
/// One active arm against the control in an adjusted logistic regression: the adjusted odds ratio exp(beta) with its
/// Wald interval exp(beta -/+ z SE) and its profile (penalized) likelihood interval, the Wald and likelihood-ratio
/// p-values of beta = 0, and the marginal (standardized) risk difference with its delta-method interval and the two
/// standardized risks it is the difference of.
/// </summary>
public sealed record AdjustedOddsRatio(
    string Arm,
    string Control,
    IntervalResult OddsRatioWald,
    IntervalResult OddsRatioProfile,
    TestResult WaldTest,
    TestResult LikelihoodRatioTest,
    IntervalResult MarginalRiskDifference,
    double StandardizedRiskArm,
    double StandardizedRiskControl);
