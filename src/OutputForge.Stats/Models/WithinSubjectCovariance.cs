using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// A covariance structure Sigma(theta) of the T visits of one subject, with its first derivatives
/// dSigma/dtheta_k and, where Sigma is not linear in theta, its second derivatives. A subject seen at
/// a subset of visits has the corresponding rows and columns of Sigma (missing at random, Jennrich and
/// Schluchter 1986). The parametrisation is the one in which Kenward and Roger's (1997) adjustment is
/// computed, so it is documented per structure in docs/methods.md.
/// </summary>
public abstract class WithinSubjectCovariance
{
    protected WithinSubjectCovariance(int visitCount)
    {
        if (visitCount < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(visitCount), "at least one visit is needed");
        }
        VisitCount = visitCount;
    }

    public int VisitCount { get; }

    public abstract MmrmCovarianceStructure Structure { get; }

    /// <summary>What each element of theta is, in order (visits numbered from 1).</summary>
    public abstract IReadOnlyList<string> ParameterNames { get; }

    public int ParameterCount => ParameterNames.Count;

    /// <summary>The smallest number of visits the structure's parameters are identifiable with.</summary>
    public virtual int MinimumVisits => 2;

    public abstract Matrix<double> Sigma(Vector<double> theta);

    public abstract Matrix<double>[] FirstDerivatives(Vector<double> theta);

    /// <summary>d2 Sigma / dtheta_a dtheta_b, or null when Sigma is linear in theta (all zero).</summary>
    public virtual Matrix<double>[,]? SecondDerivatives(Vector<double> theta) => null;

    /// <summary>
    /// Starting values from a moment estimate of Sigma (which need not be positive definite: the
    /// fitting routine falls back to its diagonal when the result is not).
    /// </summary>
    public abstract Vector<double> StartingValues(Matrix<double> empirical);

    public static WithinSubjectCovariance Create(MmrmCovarianceStructure structure, int visitCount) => structure switch
    {
        MmrmCovarianceStructure.Unstructured => new UnstructuredCovariance(visitCount),
        MmrmCovarianceStructure.CompoundSymmetry => new CompoundSymmetryCovariance(visitCount),
        MmrmCovarianceStructure.HeterogeneousCompoundSymmetry => new HeterogeneousCorrelationCovariance(visitCount, autoregressive: false),
        MmrmCovarianceStructure.Autoregressive1 => new AutoregressiveCovariance(visitCount),
        MmrmCovarianceStructure.HeterogeneousAutoregressive1 => new HeterogeneousCorrelationCovariance(visitCount, autoregressive: true),
        MmrmCovarianceStructure.Toeplitz => new ToeplitzCovariance(visitCount),
        _ => throw new ArgumentOutOfRangeException(nameof(structure)),
    };

    /// <summary>The average of the empirical correlations at lag 1 (AR starts) or all lags (CS starts), kept inside (-0.9, 0.9).</summary>
    protected static double AverageCorrelation(Matrix<double> empirical, bool lagOneOnly)
    {
        var sum = 0.0;
        var count = 0;
        for (var j = 0; j < empirical.RowCount; j++)
        {
            for (var k = j + 1; k < empirical.RowCount; k++)
            {
                if (lagOneOnly && k != j + 1)
                {
                    continue;
                }
                var scale = Math.Sqrt(empirical[j, j] * empirical[k, k]);
                if (scale > 0)
                {
                    sum += empirical[j, k] / scale;
                    count++;
                }
            }
        }
        var r = count == 0 ? 0 : sum / count;
        return Math.Clamp(r, -0.9 / Math.Max(1, empirical.RowCount - 1), 0.9);
    }

    protected static Matrix<double> Zero(int t) => Matrix<double>.Build.Dense(t, t);
}
