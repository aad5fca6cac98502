using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Heterogeneous compound symmetry or heterogeneous AR(1): Sigma_jk = s_j s_k C_jk(rho) with a variance
/// v_j = s_j^2 per visit and one correlation rho; theta = (v_1, ..., v_T, rho). C is rho off the diagonal
/// (compound symmetric) or rho^|j-k| (autoregressive). d Sigma_jk / d v_a = Sigma_jk e / v_a with e the
/// power of s_a in the cell (0, 1/2 or 1); the second derivative in v_a is Sigma_jk e (e - 1) / v_a^2.
/// </summary>
public sealed class HeterogeneousCorrelationCovariance : WithinSubjectCovariance
{
    private readonly bool _autoregressive;
    private readonly string[] _names;

    public HeterogeneousCorrelationCovariance(int visitCount, bool autoregressive) : base(visitCount)
    {
        _autoregressive = autoregressive;
        _names = [.. Enumerable.Range(1, visitCount).Select(j => $"variance({j})"), autoregressive ? "correlation (lag 1)" : "correlation"];
    }

    public override MmrmCovarianceStructure Structure =>
        _autoregressive ? MmrmCovarianceStructure.HeterogeneousAutoregressive1 : MmrmCovarianceStructure.HeterogeneousCompoundSymmetry;

    public override IReadOnlyList<string> ParameterNames => _names;

    private Matrix<double> Correlation(double rho, int order) => _autoregressive
        ? CorrelationPattern.Autoregressive(VisitCount, rho, order)
        : CorrelationPattern.CompoundSymmetric(VisitCount, rho, order);

    /// <summary>s_j s_k times the given matrix, cell by cell.</summary>
    private Matrix<double> Scaled(Vector<double> theta, Matrix<double> m) =>
        Matrix<double>.Build.Dense(VisitCount, VisitCount, (j, k) => Math.Sqrt(theta[j] * theta[k]) * m[j, k]);

    /// <summary>The power of s_a in cell (j, k): 1/2 for each of j, k that equals a.</summary>
    private static double Power(int a, int j, int k) => ((j == a ? 1 : 0) + (k == a ? 1 : 0)) / 2.0;

    public override Matrix<double> Sigma(Vector<double> theta) => Scaled(theta, Correlation(theta[VisitCount], 0));

    public override Matrix<double>[] FirstDerivatives(Vector<double> theta)
    {
        var t = VisitCount;
        var sigma = Sigma(theta);
        var d = new Matrix<double>[t + 1];
        for (var a = 0; a < t; a++)
        {
            var v = theta[a];
            var index = a;
            d[a] = Matrix<double>.Build.Dense(t, t, (j, k) => sigma[j, k] * Power(index, j, k) / v);
        }
        d[t] = Scaled(theta, Correlation(theta[t], 1));
        return d;
    }

    public override Matrix<double>[,]? SecondDerivatives(Vector<double> theta)
    {
        var t = VisitCount;
        var sigma = Sigma(theta);
        var dRho = Scaled(theta, Correlation(theta[t], 1));
        var d = new Matrix<double>[t + 1, t + 1];
        for (var a = 0; a <= t; a++)
        {
            for (var b = 0; b <= t; b++)
            {
                int ia = a, ib = b;
                if (a == t && b == t)
                {
                    d[a, b] = Scaled(theta, Correlation(theta[t], 2));
                }
                else if (a == t || b == t)
                {
                    var v = a == t ? ib : ia;
                    d[a, b] = Matrix<double>.Build.Dense(t, t, (j, k) => dRho[j, k] * Power(v, j, k) / theta[v]);
                }
                else if (a == b)
                {
                    d[a, b] = Matrix<double>.Build.Dense(t, t, (j, k) =>
                    {
                        var e = Power(ia, j, k);
                        return sigma[j, k] * e * (e - 1) / (theta[ia] * theta[ia]);
                    });
                }
                else
                {
                    d[a, b] = Matrix<double>.Build.Dense(t, t, (j, k) =>
                        sigma[j, k] * Power(ia, j, k) * Power(ib, j, k) / (theta[ia] * theta[ib]));
                }
            }
        }
        return d;
    }

    public override Vector<double> StartingValues(Matrix<double> empirical) =>
        Vector<double>.Build.DenseOfEnumerable(empirical.Diagonal().Append(AverageCorrelation(empirical, _autoregressive)));
}
