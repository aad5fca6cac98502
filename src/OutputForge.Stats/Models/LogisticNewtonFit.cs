using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Newton-Raphson maximisation of the logistic log-likelihood l(beta), or of Firth's (1993, Biometrika 80:27-38)
/// penalized log-likelihood l*(beta) = l(beta) + 1/2 log det I(beta), with some coefficients held at given values (the
/// constrained fits of a profile likelihood and of a likelihood-ratio test). I(beta) = X'WX, W = diag(pi (1 - pi)).
/// The gradient of l* is Firth's modified score U*(beta) = X'(y - pi + h (1/2 - pi)), h the diagonal of
/// W^1/2 X I^-1 X' W^1/2 (Heinze and Schemper 2002, Stat Med 21:2409-2419, section 2); without the penalty it is
/// X'(y - pi). Each step solves I_FF delta = U_F for the free coefficients F (Fisher scoring, which for the logit link
/// is Newton-Raphson on l; on l* it is the step of Heinze and Schemper), is shortened to at most
/// <see cref="MaximumStep"/> in any coefficient, and is halved while it lowers the objective. Convergence: every free
/// component of the score below <see cref="ScoreTolerance"/> and the last step below <see cref="StepTolerance"/>.
/// The penalty is always that of the full design X, also in constrained fits, as in the profile penalized likelihood of
/// Heinze and Schemper (2002, section 2.2).
/// </summary>
internal static class LogisticNewtonFit
{
    public const int MaximumIterations = 200;
    private const int MaximumHalvings = 30;
    private const double MaximumStep = 5;
    private const double ScoreTolerance = 1e-9;
    private const double StepTolerance = 1e-10;

    public sealed record Result(Vector<double> Beta, double LogLikelihood, double Objective, Matrix<double> Information,
        Vector<double> Probabilities, int Iterations, bool Converged)
    {
        /// <summary>The inverse of the Fisher information at the estimate: the covariance of the estimates.</summary>
        public Matrix<double> Covariance => Information.Inverse();
    }

    /// <param name="x">The design, intercept column included.</param>
    /// <param name="y">The 0/1 responses.</param>
    /// <param name="penalized">True for Firth's penalized likelihood, false for the plain likelihood.</param>
    /// <param name="fixedValues">Per coefficient: the value it is held at, or null when it is estimated.</param>
    /// <param name="start">Starting values of the free coefficients (the fixed ones are taken from <paramref name="fixedValues"/>).</param>
    public static Result Fit(Matrix<double> x, Vector<double> y, bool penalized, IReadOnlyList<double?>? fixedValues = null,
        Vector<double>? start = null)
    {
        var p = x.ColumnCount;
        var free = Enumerable.Range(0, p).Where(j => fixedValues?[j] is null).ToArray();
        var beta = start?.Clone() ?? Vector<double>.Build.Dense(p);
        for (var j = 0; j < p; j++)
        {
            if (fixedValues?[j] is { } value)
            {
                beta[j] = value;
            }
        }
        var state = Evaluate(x, y, beta, penalized);
        if (state is null)
        {
            return NotConverged(x, beta);
        }
        var iterations = 0;
        var converged = false;
        while (iterations < MaximumIterations)
        {
            iterations++;
            if (free.Length == 0)
            {
                converged = true;
                break;
            }
            var scoreFree = Vector<double>.Build.Dense(free.Length, k => state.Score[free[k]]);
            var informationFree = Matrix<double>.Build.Dense(free.Length, free.Length, (a, b) => state.Information[free[a], free[b]]);
            if (!TrySolve(informationFree, scoreFree, out var step))
            {
                return NotConverged(x, beta);
            }
            var largest = step.AbsoluteMaximum();
            if (largest > MaximumStep)
            {
                step *= MaximumStep / largest;
            }
            var candidate = beta.Clone();
            for (var k = 0; k < free.Length; k++)
            {
                candidate[free[k]] += step[k];
            }
            var next = Evaluate(x, y, candidate, penalized);
            for (var halving = 0; halving < MaximumHalvings && !(next is not null && next.Objective >= state.Objective - 1e-12 * Math.Abs(state.Objective)); halving++)
            {
                step *= 0.5;
                for (var k = 0; k < free.Length; k++)
                {
                    candidate[free[k]] = beta[free[k]] + step[k];
                }
                next = Evaluate(x, y, candidate, penalized);
            }
            if (next is null)
            {
                return NotConverged(x, beta);
            }
            beta = candidate;
            state = next;
            if (free.Max(j => Math.Abs(state.Score[j])) < ScoreTolerance && step.AbsoluteMaximum() < StepTolerance * Math.Max(1, beta.AbsoluteMaximum()))
            {
                converged = true;
                break;
            }
        }
        return new Result(beta, state.LogLikelihood, state.Objective, state.Information, state.Probabilities, iterations, converged);
    }

    /// <summary>
    /// The information matrix is not numerically positive definite (the fitted probabilities of whole columns at 0 or 1
    /// far out on a profile): the fit stops as not converged, which its callers report.
    /// </summary>
    private static Result NotConverged(Matrix<double> x, Vector<double> beta) =>
        new(beta, double.NaN, double.NaN, Matrix<double>.Build.DenseIdentity(x.ColumnCount), Vector<double>.Build.Dense(x.RowCount), 0, false);

    private static bool TrySolve(Matrix<double> a, Vector<double> b, out Vector<double> solution)
    {
        try
        {
            solution = a.Cholesky().Solve(b);
            return solution.All(double.IsFinite);
        }
        catch (ArgumentException)
        {
            solution = b;
            return false;
        }
    }

    private sealed record State(double LogLikelihood, double Objective, Vector<double> Score, Matrix<double> Information, Vector<double> Probabilities);

    /// <summary>The objective, score and information at beta; null where the penalty's log determinant does not exist numerically.</summary>
    private static State? Evaluate(Matrix<double> x, Vector<double> y, Vector<double> beta, bool penalized)
    {
        var n = x.RowCount;
        var eta = x * beta;
        var pi = eta.Map(Expit);
        var weight = pi.Map(v => v * (1 - v));
        double logLikelihood = 0;
        for (var i = 0; i < n; i++)
        {
            logLikelihood += y[i] * eta[i] - LogOnePlusExp(eta[i]);
        }
        var information = x.TransposeThisAndMultiply(x.Clone().MapIndexed((i, _, v) => v * weight[i]));
        var residual = y - pi;
        var objective = logLikelihood;
        if (penalized)
        {
            MathNet.Numerics.LinearAlgebra.Factorization.Cholesky<double> cholesky;
            try
            {
                cholesky = information.Cholesky();
            }
            catch (ArgumentException)
            {
                return null;
            }
            objective += 0.5 * cholesky.DeterminantLn;
            // h_i = w_i x_i' I^-1 x_i, the leverages of the weighted fit.
            var solved = x * cholesky.Solve(Matrix<double>.Build.DenseIdentity(x.ColumnCount));
            for (var i = 0; i < n; i++)
            {
                var h = weight[i] * solved.Row(i).DotProduct(x.Row(i));
                residual[i] += h * (0.5 - pi[i]);
            }
        }
        return new State(logLikelihood, objective, x.TransposeThisAndMultiply(residual), information, pi);
    }

    /// <summary>1 / (1 + e^-eta), computed without overflow on either side.</summary>
    internal static double Expit(double eta) => eta >= 0 ? 1 / (1 + Math.Exp(-eta)) : Math.Exp(eta) / (1 + Math.Exp(eta));

    /// <summary>ln(1 + e^eta) without overflow.</summary>
    private static double LogOnePlusExp(double eta) => eta > 0 ? eta + double.LogP1(Math.Exp(-eta)) : double.LogP1(Math.Exp(eta));
}
