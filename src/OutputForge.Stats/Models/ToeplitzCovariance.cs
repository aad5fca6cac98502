using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Toeplitz covariance: Sigma_jk = gamma_|j-k| with theta = (gamma_0, ..., gamma_{T-1}), the variance and
/// one covariance per lag. Linear in theta.
/// </summary>
public sealed class ToeplitzCovariance : WithinSubjectCovariance
{
    private readonly string[] _names;

    public ToeplitzCovariance(int visitCount) : base(visitCount)
    {
        _names = [.. Enumerable.Range(0, visitCount).Select(lag => lag == 0 ? "variance" : $"covariance (lag {lag})")];
    }

    public override MmrmCovarianceStructure Structure => MmrmCovarianceStructure.Toeplitz;
    public override IReadOnlyList<string> ParameterNames => _names;

    public override Matrix<double> Sigma(Vector<double> theta) =>
        Matrix<double>.Build.Dense(VisitCount, VisitCount, (j, k) => theta[Math.Abs(j - k)]);

    public override Matrix<double>[] FirstDerivatives(Vector<double> theta) =>
        [.. Enumerable.Range(0, VisitCount).Select(lag => Matrix<double>.Build.Dense(VisitCount, VisitCount, (j, k) => Math.Abs(j - k) == lag ? 1.0 : 0.0))];

    public override Vector<double> StartingValues(Matrix<double> empirical)
    {
        var t = VisitCount;
        var gamma = new double[t];
        for (var lag = 0; lag < t; lag++)
        {
            gamma[lag] = Enumerable.Range(0, t - lag).Average(j => empirical[j, j + lag]);
        }
        return Vector<double>.Build.DenseOfArray(gamma);
    }
}
