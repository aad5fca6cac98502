using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats;

/// <summary>
/// Cox proportional hazards regression (Cox, JRSS B 34, 1972) fitted by Newton-Raphson on the log
/// partial likelihood, with Efron's or Breslow's handling of tied event times and optional strata
/// (a separate baseline hazard per stratum). As in R survival's coxph: start at b = 0, halve a step
/// that lowers the likelihood, stop when the relative change of the log likelihood is below 1e-9
/// (here followed by steps until the estimate no longer moves), at most 20 iterations. A fit that
/// does not converge, or whose likelihood is monotone (an arm without events), gives no estimate.
/// </summary>
public static class CoxProportionalHazards
{
    public const int MaxIterations = 20;
    private const double LikelihoodTolerance = 1e-9;
    private const int MaxHalvings = 30;

    /// <param name="covariates">One row per observation, one column per covariate.</param>
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
        var problem = new PartialLikelihood(data, x, ties, stratum);
        var beta = Vector<double>.Build.Dense(p);
        var current = problem.Evaluate(beta);
        if (!IsInvertible(current.Information))
        {
            return NotEstimable(ties, "the information matrix is singular (a covariate does not vary within the risk sets)");
        }
        for (var iteration = 1; iteration <= MaxIterations; iteration++)
        {
            var step = current.Information.Solve(current.Score);
            var candidate = beta + step;
            var next = problem.Evaluate(candidate);
            var halvings = 0;
            while ((double.IsNaN(next.LogLikelihood) || next.LogLikelihood < current.LogLikelihood) && halvings++ < MaxHalvings)
            {
                step /= 2;
                candidate = beta + step;
                next = problem.Evaluate(candidate);
            }
            var converged = Math.Abs(1 - current.LogLikelihood / next.LogLikelihood) <= LikelihoodTolerance
                && step.AbsoluteMaximum() <= 1e-8 * (1 + candidate.AbsoluteMaximum());
            beta = candidate;
            current = next;
            if (!IsInvertible(current.Information))
            {
                return NotEstimable(ties, $"the information matrix became singular at iteration {iteration}; the likelihood may be monotone (a coefficient tends to infinity)", iteration);
            }
            if (converged)
            {
                if (beta.AbsoluteMaximum() > 15)
                {
                    return NotEstimable(ties, "a coefficient exceeds 15 on the log scale; the likelihood is probably monotone (an arm without events)", iteration);
                }
                return new CoxModelFit(beta, current.Information.Inverse(), current.LogLikelihood, iteration, ties, null);
            }
        }
        return NotEstimable(ties, $"Newton-Raphson did not converge in {MaxIterations} iterations", MaxIterations);
    }

    private static bool IsInvertible(Matrix<double> m) =>
        m.RowCount == 0 || (m.Determinant() is var det && double.IsFinite(det) && Math.Abs(det) > 1e-12 * Math.Pow(Math.Max(m.InfinityNorm(), 1e-300), m.RowCount));

    private static CoxModelFit NotEstimable(CoxTies ties, string reason, int iterations = 0) =>
        new(null, null, double.NaN, iterations, ties, reason);
}
