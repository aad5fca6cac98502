namespace OutputForge.Stats.Models;

/// <summary>
/// A fitted logistic regression: coefficients on the logit scale with their covariance, the residual
/// deviance (-2 log-likelihood for 0/1 data), how many iterations were run and whether they converged,
/// and the separation diagnosis; or the reason no fit was attempted (a rank-deficient design).
/// </summary>
public sealed record LogisticRegressionFit(
    IReadOnlyList<string> ColumnNames,
    IReadOnlyList<double> Coefficients,
    double[,] Covariance,
    double Deviance,
    int Observations,
    int Iterations,
    bool Converged,
    Separation Separation,
    int FittedAtBoundary,
    IReadOnlyList<double> FittedProbabilities,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    /// <summary>Number of model parameters (design columns).</summary>
    public int Parameters => ColumnNames.Count;

    /// <summary>Residual degrees of freedom, n - p.</summary>
    public int ResidualDegreesOfFreedom => Observations - Parameters;

    public double StandardError(int column) => Math.Sqrt(Covariance[column, column]);

    /// <summary>
    /// Why the estimates are not maximum-likelihood estimates (no convergence, separation), for the
    /// table's notes; empty when the fit is sound.
    /// </summary>
    public IReadOnlyList<string> Problems
    {
        get
        {
            var problems = new List<string>();
            if (!IsEstimable)
            {
                problems.Add(NotEstimableReason!);
                return problems;
            }
            if (!Converged)
            {
                problems.Add($"the fit did not converge in {Iterations} iterations");
            }
            if (Separation != Separation.None)
            {
                problems.Add(Separation == Separation.Complete
                    ? "complete separation: every fitted probability is 0 or 1"
                    : $"quasi-complete separation: {FittedAtBoundary} of {Observations} fitted probabilities are 0 or 1");
            }
            return problems;
        }
    }

    internal static LogisticRegressionFit NotEstimable(IReadOnlyList<string> columnNames, int observations, string reason) =>
        new(columnNames, [], new double[0, 0], double.NaN, observations, 0, false, Separation.None, 0, [], reason);
}
