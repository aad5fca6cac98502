using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// First-order autoregressive covariance: Sigma_jk = s2 rho^|j-k| with theta = (s2, rho), the visits
/// taken as equally spaced positions 1..T. Not linear in rho, so the second derivatives enter
/// Kenward and Roger's adjusted covariance.
/// </summary>
public sealed class AutoregressiveCovariance(int visitCount) : WithinSubjectCovariance(visitCount)
{
    private static readonly string[] Names = ["variance", "correlation (lag 1)"];

    public override MmrmCovarianceStructure Structure => MmrmCovarianceStructure.Autoregressive1;
    public override IReadOnlyList<string> ParameterNames => Names;

    public override Matrix<double> Sigma(Vector<double> theta) => CorrelationPattern.Autoregressive(VisitCount, theta[1], 0) * theta[0];

    public override Matrix<double>[] FirstDerivatives(Vector<double> theta) =>
        [CorrelationPattern.Autoregressive(VisitCount, theta[1], 0), CorrelationPattern.Autoregressive(VisitCount, theta[1], 1) * theta[0]];

    public override Matrix<double>[,]? SecondDerivatives(Vector<double> theta)
    {
        var dRho = CorrelationPattern.Autoregressive(VisitCount, theta[1], 1);
        return new[,]
        {
            { Zero(VisitCount), dRho },
            { dRho, CorrelationPattern.Autoregressive(VisitCount, theta[1], 2) * theta[0] },
        };
    }

    public override Vector<double> StartingValues(Matrix<double> empirical) =>
        Vector<double>.Build.DenseOfArray([empirical.Diagonal().Average(), AverageCorrelation(empirical, lagOneOnly: true)]);
}
