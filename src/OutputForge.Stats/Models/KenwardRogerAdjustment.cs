using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Kenward and Roger (Biometrics 53, 1997): the small-sample adjusted covariance of the REML estimate of
/// beta and the denominator degrees of freedom and scale of the Wald F test of L beta = 0.
///   Phi_A = Phi + 2 Phi { sum_ij W_ij (Q_ij - P_i Phi P_j - 1/4 R_ij) } Phi
/// with P_i = -X'V^-1 V_i V^-1 X, Q_ij = X'V^-1 V_i V^-1 V_j V^-1 X, R_ij = X'V^-1 V_ij V^-1 X and W the
/// inverse of the expected information of theta. For L of rank q, Theta = L'(L Phi L')^-1 L,
///   A1 = sum_ij W_ij tr(Theta Phi P_i Phi) tr(Theta Phi P_j Phi),  A2 = sum_ij W_ij tr(Theta Phi P_i Phi Theta Phi P_j Phi),
///   B = (A1 + 6 A2) / (2q),  g = ((q+1) A1 - (q+4) A2) / ((q+2) A2),  c1 = g / (3q + 2(1-g)),
///   c2 = (q-g) / (3q + 2(1-g)),  c3 = (q+2-g) / (3q + 2(1-g)),  E* = 1 / (1 - A2/q),
///   V* = (2/q) (1 + c1 B) / ((1 - c2 B)^2 (1 - c3 B)),  rho = V* / (2 E*^2),
///   m = 4 + (q+2) / (q rho - 1),  lambda = m / (E* (m - 2)),
/// and F* = lambda (L beta)'(L Phi_A L')^-1 (L beta) / q is referred to F(q, m). For q = 1, lambda = 1.
/// </summary>
internal sealed class KenwardRogerAdjustment
{
    private readonly Matrix<double> _phi;
    private readonly Matrix<double>[] _p;
    private readonly Matrix<double> _w;

    private KenwardRogerAdjustment(Matrix<double> phi, Matrix<double>[] p, Matrix<double> w, Matrix<double> adjusted)
    {
        _phi = phi;
        _p = p;
        _w = w;
        AdjustedCovariance = adjusted;
    }

    public Matrix<double> AdjustedCovariance { get; }

    public static KenwardRogerAdjustment Create(Matrix<double> phi, Matrix<double>[] m, Matrix<double> w,
        Matrix<double>[,] q, Matrix<double>[,]? r)
    {
        var count = m.Length;
        var p = m.Select(mi => -mi).ToArray();
        var sum = Matrix<double>.Build.Dense(phi.RowCount, phi.ColumnCount);
        for (var i = 0; i < count; i++)
        {
            for (var j = 0; j < count; j++)
            {
                var term = q[i, j] - p[i] * phi * p[j];
                if (r is not null)
                {
                    term -= r[i, j] * 0.25;
                }
                sum += term * w[i, j];
            }
        }
        var adjusted = phi + phi * sum * phi * 2;
        adjusted = (adjusted + adjusted.Transpose()) * 0.5;
        return new KenwardRogerAdjustment(phi, p, w, adjusted);
    }

    /// <summary>The denominator df m and the scale lambda of the F statistic for hypothesis rows <paramref name="l"/>.</summary>
    public (double DegreesOfFreedom, double Scale) Test(Matrix<double> l)
    {
        var q = l.RowCount;
        var theta = l.Transpose() * (l * _phi * l.Transpose()).Inverse() * l;
        var u = _p.Select(pi => theta * _phi * pi * _phi).ToArray();
        double a1 = 0, a2 = 0;
        for (var i = 0; i < u.Length; i++)
        {
            for (var j = 0; j < u.Length; j++)
            {
                a1 += _w[i, j] * u[i].Trace() * u[j].Trace();
                a2 += _w[i, j] * (u[i] * u[j]).Trace();
            }
        }
        var b = (a1 + 6 * a2) / (2 * q);
        var g = ((q + 1) * a1 - (q + 4) * a2) / ((q + 2) * a2);
        var denominator = 3 * q + 2 * (1 - g);
        var c1 = g / denominator;
        var c2 = (q - g) / denominator;
        var c3 = (q + 2 - g) / denominator;
        var eStar = 1 / (1 - a2 / q);
        var vStar = 2.0 / q * (1 + c1 * b) / ((1 - c2 * b) * (1 - c2 * b) * (1 - c3 * b));
        var rho = vStar / (2 * eStar * eStar);
        var m = 4 + (q + 2) / (q * rho - 1);
        var lambda = m / (eStar * (m - 2));
        return (m, lambda);
    }
}
