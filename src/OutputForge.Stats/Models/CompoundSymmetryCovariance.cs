using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Compound symmetry: Sigma = c J + s2 I with theta = (c, s2), c the covariance of any two visits
/// (the between-subject component) and s2 the within-subject variance; the variance of one visit is
/// c + s2 and the correlation c / (c + s2). Linear in theta, as the random-intercept form of the model.
/// </summary>
public sealed class CompoundSymmetryCovariance(int visitCount) : WithinSubjectCovariance(visitCount)
{
    private static readonly string[] Names = ["covariance (between subjects)", "variance (within subjects)"];

    public override MmrmCovarianceStructure Structure => MmrmCovarianceStructure.CompoundSymmetry;
    public override IReadOnlyList<string> ParameterNames => Names;

    public override Matrix<double> Sigma(Vector<double> theta) =>
        Matrix<double>.Build.Dense(VisitCount, VisitCount, theta[0]) + Matrix<double>.Build.DenseIdentity(VisitCount) * theta[1];

    public override Matrix<double>[] FirstDerivatives(Vector<double> theta) =>
        [Matrix<double>.Build.Dense(VisitCount, VisitCount, 1.0), Matrix<double>.Build.DenseIdentity(VisitCount)];

    public override Vector<double> StartingValues(Matrix<double> empirical)
    {
        var variance = empirical.Diagonal().Average();
        var covariance = variance * AverageCorrelation(empirical, lagOneOnly: false);
        return Vector<double>.Build.DenseOfArray([covariance, variance - covariance]);
    }
}
