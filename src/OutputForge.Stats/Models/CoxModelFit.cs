using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// A fitted Cox proportional hazards model: coefficients (log hazard ratios), their covariance (the
/// inverse of the observed information at the estimate), the log partial likelihood and the number of
/// Newton-Raphson iterations, or why no estimate can be given (non-convergence, monotone likelihood).
/// </summary>
public sealed class CoxModelFit
{
    internal CoxModelFit(Vector<double>? coefficients, Matrix<double>? covariance, double logLikelihood, int iterations,
        CoxTies ties, string? notEstimableReason)
    {
        _coefficients = coefficients;
        _covariance = covariance;
        LogLikelihood = logLikelihood;
        Iterations = iterations;
        Ties = ties;
        NotEstimableReason = notEstimableReason;
    }

    private readonly Vector<double>? _coefficients;
    private readonly Matrix<double>? _covariance;

    public bool IsEstimable => NotEstimableReason is null;
    public string? NotEstimableReason { get; }
    public double LogLikelihood { get; }
    public int Iterations { get; }
    public CoxTies Ties { get; }

    public Vector<double> Coefficients => _coefficients ?? throw new InvalidOperationException(NotEstimableReason);
    public Matrix<double> Covariance => _covariance ?? throw new InvalidOperationException(NotEstimableReason);

    public double StandardError(int j) => Math.Sqrt(Covariance[j, j]);

    /// <summary>exp(b_j) with the Wald interval exp(b_j +- z se_j); not estimable when the fit is not.</summary>
    public IntervalResult HazardRatio(int j, double level)
    {
        if (!IsEstimable)
        {
            return IntervalResult.NotEstimable(NotEstimableReason!);
        }
        var z = MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, 1 - (1 - level) / 2);
        var b = Coefficients[j];
        var se = StandardError(j);
        return new IntervalResult(Math.Exp(b), Math.Exp(b - z * se), Math.Exp(b + z * se));
    }

    /// <summary>The Wald chi-square test of b_j = 0 (1 degree of freedom).</summary>
    public TestResult WaldTest(int j)
    {
        const string method = "Wald test of the Cox model coefficient";
        if (!IsEstimable)
        {
            return TestResult.NotEstimable(method, NotEstimableReason!);
        }
        var z = Coefficients[j] / StandardError(j);
        return new TestResult(method, z * z, 1, MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(0.5, z * z / 2));
    }
}
