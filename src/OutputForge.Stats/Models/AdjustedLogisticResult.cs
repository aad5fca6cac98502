namespace OutputForge.Stats.Models;

/// <summary>
/// A covariate-adjusted logistic regression as an analysis: how it was estimated (maximum likelihood, or Firth's
/// penalized likelihood and why), the coefficients, each active arm against the control, the tests of the treatment
/// term, the fit's -2 log-likelihood and the notes a table must show; or why it could not be estimated.
/// </summary>
public sealed record AdjustedLogisticResult(
    bool FirthUsed,
    IReadOnlyList<LogisticCoefficient> Coefficients,
    IReadOnlyList<AdjustedOddsRatio> Comparisons,
    TestResult TreatmentLikelihoodRatioTest,
    TestResult TreatmentWaldTest,
    double Deviance,
    double? PenalizedLogLikelihood,
    int Observations,
    int Iterations,
    Separation Separation,
    IReadOnlyList<LogisticAnalysisNote> Notes,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    internal static AdjustedLogisticResult NotEstimable(int observations, Separation separation, string reason, IReadOnlyList<LogisticAnalysisNote>? notes = null) =>
        new(false, [], [], TestResult.NotEstimable(AdjustedLogisticRegression.LikelihoodRatioMethod, reason),
            TestResult.NotEstimable(AdjustedLogisticRegression.WaldMethod, reason), double.NaN, null, observations, 0, separation, notes ?? [], reason);
}
