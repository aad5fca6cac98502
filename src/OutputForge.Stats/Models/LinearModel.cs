using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace OutputForge.Stats.Models;

/// <summary>
/// Ordinary least squares fit of y = Xb + e by the QR decomposition of X (MathNet.Numerics,
/// Householder), which avoids forming X'X and keeps full accuracy on ill-conditioned data such as
/// the NIST StRD regression problems. Residual variance s^2 = RSS / (n - p); covariance of b is
/// s^2 (R'R)^-1 (Searle, Linear Models, 1971, ch. 3).
/// </summary>
public static class LinearModel
{
    /// <summary>A column is taken as linearly dependent on earlier ones when |R_jj| falls below this share of its norm.</summary>
    private const double RankTolerance = 1e-10;

    public static LinearModelFit Fit(IReadOnlyList<double> response, LinearModelDesign design)
    {
        var n = design.RowCount;
        var p = design.ColumnNames.Count;
        if (response.Count != n)
        {
            throw new ArgumentException($"{response.Count} responses for {n} observations", nameof(response));
        }
        if (response.Any(v => !double.IsFinite(v)))
        {
            throw new ArgumentException("responses must be finite numbers", nameof(response));
        }
        if (n <= p)
        {
            return NotEstimable(design, $"{n} observations are too few for {p} model parameters (no residual degrees of freedom)");
        }
        var x = design.Matrix;
        var qr = x.QR(QRMethod.Thin);
        var r = qr.R;
        for (var j = 0; j < p; j++)
        {
            var norm = x.Column(j).L2Norm();
            if (norm == 0 || Math.Abs(r[j, j]) < RankTolerance * norm)
            {
                return NotEstimable(design,
                    $"the design matrix is rank deficient: {design.ColumnNames[j]} is not estimable (empty level or collinear covariate)");
            }
        }
        var y = Vector<double>.Build.DenseOfEnumerable(response);
        var b = qr.Solve(y);
        var residuals = y - x * b;
        var rss = residuals.DotProduct(residuals);
        var df = n - p;
        var s2 = rss / df;
        var rInverse = r.Inverse();
        var covariance = rInverse * rInverse.Transpose() * s2;
        return new LinearModelFit(design, b, covariance, s2, df, rss, null)
        {
            HasDegenerateVariance = DegenerateVariance.Holds(rss, y.DotProduct(y), n),
        };
    }

    private static LinearModelFit NotEstimable(LinearModelDesign design, string reason) =>
        new(design, null, null, double.NaN, 0, double.NaN, reason);
}
