using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Satterthwaite (Biometrics Bulletin 2, 1946) denominator degrees of freedom for c'beta of a mixed
/// model: nu = 2 (c'Phi c)^2 / (g' A g), with g_j = d(c'Phi c)/dtheta_j = c'Phi M_j Phi c and A the inverse
/// of the observed information of theta at the estimate. For a hypothesis of q rows, Fai and Cornelius
/// (J Stat Comput Simul 54, 1996): with L Phi L' = U D U', nu_m for each row u_m'L, E = sum over nu_m &gt; 2
/// of nu_m / (nu_m - 2), and the df are 2E / (E - q) when E &gt; q.
/// </summary>
internal static class SatterthwaiteDegreesOfFreedom
{
    public static double Single(Vector<double> c, Matrix<double> phi, Matrix<double>[] m, Matrix<double> parameterCovariance)
    {
        var phiC = phi * c;
        var variance = c.DotProduct(phiC);
        var g = Vector<double>.Build.DenseOfEnumerable(m.Select(mj => phiC.DotProduct(mj * phiC)));
        return 2 * variance * variance / g.DotProduct(parameterCovariance * g);
    }

    /// <summary>The Fai-Cornelius df, or NaN when E &lt;= q (the caller reports it as not estimable).</summary>
    public static double Multiple(Matrix<double> l, Matrix<double> phi, Matrix<double>[] m, Matrix<double> parameterCovariance)
    {
        var q = l.RowCount;
        var evd = (l * phi * l.Transpose()).Evd(Symmetricity.Symmetric);
        var e = 0.0;
        for (var k = 0; k < q; k++)
        {
            var row = l.Transpose() * evd.EigenVectors.Column(k);
            var nu = Single(row, phi, m, parameterCovariance);
            if (nu > 2)
            {
                e += nu / (nu - 2);
            }
        }
        return e > q ? 2 * e / (e - q) : double.NaN;
    }
}
