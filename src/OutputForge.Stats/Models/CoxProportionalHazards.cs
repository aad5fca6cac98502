using MathNet.Numerics.LinearAlgebra;
using OutputForge.Stats.Survival;

namespace OutputForge.Stats.Models;

/// <summary>
/// Cox proportional hazards regression (Cox, JRSS B 34, 1972) fitted by Newton-Raphson on the log
/// partial likelihood, with Efron's or Breslow's handling of tied event times and optional strata
/// (a separate baseline hazard per stratum). As in R survival's coxph: start at b = 0, halve a step
/// that lowers the likelihood, at most 20 iterations; converged when the Newton step is below 1e-10
/// relative to the estimate. A fit that
/// does not converge, or whose likelihood is monotone (an arm without events), gives no estimate.
/// </summary>
public static class CoxProportionalHazards
{
    public const int MaxIterations = 20;
    private const double LikelihoodTolerance = 1e-12;
    private const double StepTolerance = 1e-10;
    private const int MaxHalvings = 30;

    /// <param name="data">The observations' times and event flags.</param>
    /// <param name="covariates">One row per observation, one column per covariate.</param>
    /// <param name="ties">How tied event times enter the partial likelihood.</param>
    /// <param name="stratum">Stratum index of each observation, or null.</param>
    public static CoxModelFit Fit(SurvivalData data, double[,] covariates, CoxTies ties = CoxTies.Efron, IReadOnlyList<int>? stratum = null)
    {
        var n = data.Count;
        var p = covariates.GetLength(1);
        if (covariates.GetLength(0) != n || (stratum is not null && stratum.Count != n))
        {
            throw new ArgumentException("one covariate row (and stratum) is needed per observation");
        }
        if (data.EventCount == 0)
        {
            return NotEstimable(ties, "there are no events");
        }
        var x = Matrix<double>.Build.DenseOfArray(covariates);
        var problem = new CoxPartialLikelihood(data, x, ties, stratum);
        var beta = Vector<double>.Build.Dense(p);
        var current = problem.Evaluate(beta);
        if (!IsInvertible(current.Information))
        {
            return NotEstimable(ties, "the information matrix is singular (a covariate does not vary within the risk sets)");
        }
        for (var iteration = 0; iteration <= MaxIterations; iteration++)
        {
            var step = current.Information.Solve(current.Score);
            // Converged when the full Newton step no longer moves the estimate: at the maximum the
            // likelihood itself is flat to rounding, so it cannot decide the last digits.
            if (step.AbsoluteMaximum() <= StepTolerance * (1 + beta.AbsoluteMaximum()))
            {
                if (beta.AbsoluteMaximum() > 15)
                {
                    return NotEstimable(ties, "a coefficient exceeds 15 on the log scale; the likelihood is probably monotone (an arm without events)", iteration);
                }
                return new CoxModelFit(beta, current.Information.Inverse(), current.LogLikelihood, iteration, ties, null);
            }
            if (iteration == MaxIterations)
            {
                break;
            }
            var candidate = beta + step;
            var next = problem.Evaluate(candidate);
            var halvings = 0;
            var floor = current.LogLikelihood - LikelihoodTolerance * Math.Abs(current.LogLikelihood);
            while ((double.IsNaN(next.LogLikelihood) || next.LogLikelihood < floor) && halvings++ < MaxHalvings)
            {
                step /= 2;
                candidate = beta + step;
                next = problem.Evaluate(candidate);
            }
            beta = candidate;
            current = next;
            if (!IsInvertible(current.Information))
            {
                return NotEstimable(ties, $"the information matrix became singular at iteration {iteration + 1}; the likelihood may be monotone (a coefficient tends to infinity)", iteration + 1);
            }
        }
        return NotEstimable(ties, $"Newton-Raphson did not converge in {MaxIterations} iterations", MaxIterations);
    }

    private static bool IsInvertible(Matrix<double> m) =>
        m.RowCount == 0 || (m.Determinant() is var det && double.IsFinite(det) && Math.Abs(det) > 1e-12 * Math.Pow(Math.Max(m.InfinityNorm(), 1e-300), m.RowCount));

    private static CoxModelFit NotEstimable(CoxTies ties, string reason, int iterations = 0) =>
        new(null, null, double.NaN, iterations, ties, reason);
}
