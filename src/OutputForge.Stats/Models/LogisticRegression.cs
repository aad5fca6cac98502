using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace OutputForge.Stats.Models;

/// <summary>
/// Maximum-likelihood logistic regression of a 0/1 response by iteratively reweighted least squares
/// (Fisher scoring, which for the canonical logit link is Newton-Raphson; McCullagh and Nelder 1989,
/// Generalized Linear Models 2nd ed., section 2.5). Each step solves the weighted least-squares
/// problem by the QR decomposition of W^1/2 X (MathNet.Numerics, Householder), never forming X'WX.
/// The start (mu = (y + 1/2) / 2), the clamping of the linear predictor at +/-30, the convergence rule
/// |D - D_old| / (|D| + 0.1) &lt; 1e-8 and the limit of 25 iterations follow R's glm.fit (R 4.2.2), so a
/// fit that R reports as not converged is reported here as well. Separation (Albert and Anderson 1984,
/// Biometrika 71:1-10) shows as fitted probabilities within 10 machine epsilons of 0 or 1, the
/// threshold of R's warning; every fitted probability there means complete separation, some of them
/// quasi-complete separation. Either way the maximum-likelihood estimates do not exist.
/// R's own warning threshold (10 DBL_EPSILON) misses quasi-complete separation of categorical designs:
/// R's glm reports convergence there with a coefficient near 20 and fitted probabilities about 1e-9
/// from the bound (checked with R 4.2.2, Oracles/generate_logistic_oracles.R). A converged fit of a
/// categorical design has the observed proportions of its cells as fitted probabilities, at least 1/n
/// away from 0 and 1 unless a cell has no responses or only responses; so a fitted probability within
/// <see cref="BoundaryDistance"/> of 0 or 1 is taken as separation.
/// </summary>
public static class LogisticRegression
{
    public const int DefaultMaxIterations = 25;
    public const double DefaultTolerance = 1e-8;

    /// <summary>R's logit link clamps the linear predictor here (MTHRESH/THRESH in family.c).</summary>
    private const double EtaLimit = 30;

    /// <summary>A column is taken as linearly dependent on earlier ones when |R_jj| falls below this share of its norm.</summary>
    private const double RankTolerance = 1e-10;

    /// <param name="response">1 for a response, 0 otherwise.</param>
    /// <param name="design">The model matrix, the intercept column included, one row per subject.</param>
    /// <param name="columnNames">Names of the design columns, for messages.</param>
    /// <param name="maxIterations">R's glm.control maxit.</param>
    /// <param name="tolerance">R's glm.control epsilon, on the relative change of the deviance.</param>
    public static LogisticRegressionFit Fit(IReadOnlyList<int> response, double[,] design, IReadOnlyList<string> columnNames,
        int maxIterations = DefaultMaxIterations, double tolerance = DefaultTolerance)
    {
        int n = design.GetLength(0), p = design.GetLength(1);
        if (response.Count != n)
        {
            throw new ArgumentException($"{response.Count} responses for {n} observations", nameof(response));
        }
        if (columnNames.Count != p)
        {
            throw new ArgumentException($"{columnNames.Count} column names for {p} design columns", nameof(columnNames));
        }
        if (response.Any(y => y is not (0 or 1)))
        {
            throw new ArgumentException("responses must be 0 or 1", nameof(response));
        }
        var x = Matrix<double>.Build.DenseOfArray(design);
        if (RankProblem(x, columnNames) is { } rankReason)
        {
            return LogisticRegressionFit.NotEstimable(columnNames, n, rankReason);
        }
        var y = Vector<double>.Build.Dense(n, i => response[i]);
        var mu = y.Map(v => (v + 0.5) / 2);
        var eta = mu.Map(m => Math.Log(m / (1 - m)));
        double deviance = Deviance(y, mu);
        var beta = Vector<double>.Build.Dense(p);
        var converged = false;
        int iteration = 0;
        Matrix<double> r = null!;
        while (iteration < maxIterations)
        {
            iteration++;
            var slope = eta.Map(Slope);
            var z = Vector<double>.Build.Dense(n, i => eta[i] + (y[i] - mu[i]) / slope[i]);
            var w = Vector<double>.Build.Dense(n, i => Math.Sqrt(slope[i] * slope[i] / (mu[i] * (1 - mu[i]))));
            var weighted = Matrix<double>.Build.Dense(n, p, (i, j) => x[i, j] * w[i]);
            var qr = weighted.QR(QRMethod.Thin);
            r = qr.R;
            beta = qr.Solve(z.PointwiseMultiply(w));
            eta = x * beta;
            mu = eta.Map(Mean);
            double previous = deviance;
            deviance = Deviance(y, mu);
            if (Math.Abs(deviance - previous) / (Math.Abs(deviance) + 0.1) < tolerance)
            {
                converged = true;
                break;
            }
        }
        // As R's summary.glm: the covariance (X'WX)^-1 with the weights of the last iteration.
        var rInverse = r.Inverse();
        var covariance = rInverse * rInverse.Transpose();
        double edge = BoundaryDistance;
        int atBoundary = mu.Count(m => m < edge || m > 1 - edge);
        var separation = atBoundary == 0 ? Separation.None : atBoundary == n ? Separation.Complete : Separation.QuasiComplete;
        return new LogisticRegressionFit(columnNames, beta.ToArray(), covariance.ToArray(), deviance, n, iteration, converged,
            separation, atBoundary, mu.ToArray());
    }

    /// <summary>Fitted probabilities nearer than this to 0 or 1 mark separation (see the class notes).</summary>
    public const double BoundaryDistance = 1e-6;

    /// <summary>DBL_EPSILON, the spacing of doubles at 1 (R's .Machine$double.eps).</summary>
    internal const double MachineEpsilon = 2.220446049250313e-16;

    private static string? RankProblem(Matrix<double> x, IReadOnlyList<string> names)
    {
        if (x.RowCount < x.ColumnCount)
        {
            return $"{x.RowCount} observations are too few for {x.ColumnCount} model parameters";
        }
        var r = x.QR(QRMethod.Thin).R;
        for (int j = 0; j < x.ColumnCount; j++)
        {
            var norm = x.Column(j).L2Norm();
            if (norm == 0 || Math.Abs(r[j, j]) < RankTolerance * norm)
            {
                return $"the design matrix is rank deficient: {names[j]} is not estimable (empty cell or collinear column)";
            }
        }
        return null;
    }

    /// <summary>The inverse logit with R's clamping (logit_linkinv): mu stays about DBL_EPSILON away from 0 and 1.</summary>
    internal static double Mean(double eta)
    {
        double e = eta < -EtaLimit ? MachineEpsilon : eta > EtaLimit ? 1 / MachineEpsilon : Math.Exp(eta);
        return e / (1 + e);
    }

    /// <summary>d mu / d eta = e^eta / (1 + e^eta)^2, floored at DBL_EPSILON beyond the clamp (R's logit_mu_eta).</summary>
    private static double Slope(double eta)
    {
        if (eta < -EtaLimit || eta > EtaLimit)
        {
            return MachineEpsilon;
        }
        double e = Math.Exp(eta);
        return e / ((1 + e) * (1 + e));
    }

    /// <summary>The binomial deviance 2 sum [y ln(y / mu) + (1 - y) ln((1 - y) / (1 - mu))] for 0/1 y.</summary>
    private static double Deviance(Vector<double> y, Vector<double> mu)
    {
        double sum = 0;
        for (int i = 0; i < y.Count; i++)
        {
            sum += y[i] == 1 ? -Math.Log(mu[i]) : -Math.Log(1 - mu[i]);
        }
        return 2 * sum;
    }
}
