using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// A fitted general linear model: coefficients, residual variance, covariance of the estimates
/// s^2 (X'X)^-1, or the reason the model could not be fitted (rank deficiency, too few observations).
/// </summary>
public sealed class LinearModelFit
{
    internal LinearModelFit(LinearModelDesign design, Vector<double>? coefficients, Matrix<double>? covariance,
        double residualVariance, int residualDf, double residualSumOfSquares, string? notEstimableReason)
    {
        Design = design;
        _coefficients = coefficients;
        _covariance = covariance;
        ResidualVariance = residualVariance;
        ResidualDegreesOfFreedom = residualDf;
        ResidualSumOfSquares = residualSumOfSquares;
        NotEstimableReason = notEstimableReason;
    }

    private readonly Vector<double>? _coefficients;
    private readonly Matrix<double>? _covariance;

    public LinearModelDesign Design { get; }
    public bool IsEstimable => NotEstimableReason is null;
    public string? NotEstimableReason { get; }
    public double ResidualVariance { get; }
    public double ResidualStandardDeviation => Math.Sqrt(ResidualVariance);
    public int ResidualDegreesOfFreedom { get; }

    /// <summary>
    /// The residual variance is zero up to rounding relative to the response's scale (<see cref="DegenerateVariance"/>):
    /// the coefficients fit exactly, but standard errors, intervals and tests are rounding noise.
    /// </summary>
    public bool HasDegenerateVariance { get; init; }
    public double ResidualSumOfSquares { get; }

    public Vector<double> Coefficients => _coefficients ?? throw new InvalidOperationException(NotEstimableReason);
    public Matrix<double> Covariance => _covariance ?? throw new InvalidOperationException(NotEstimableReason);

    public double StandardError(int column) => Math.Sqrt(Covariance[column, column]);

    /// <summary>The estimate c'b with standard error sqrt(c' V c) and a t-based interval at <paramref name="level"/>.</summary>
    public LinearContrastResult Contrast(Vector<double> c, double level)
    {
        var estimate = c.DotProduct(Coefficients);
        var se = Math.Sqrt(c.DotProduct(Covariance * c));
        var df = ResidualDegreesOfFreedom;
        var quantile = StudentT.InvCDF(0, 1, df, 1 - (1 - level) / 2);
        var t = estimate / se;
        var p = 2 * StudentT.CDF(0, 1, df, -Math.Abs(t));
        return new LinearContrastResult(estimate, se, df, estimate - quantile * se, estimate + quantile * se, t, p);
    }

    /// <summary>The t test of one coefficient (c = unit vector).</summary>
    public LinearContrastResult Coefficient(int column, double level)
    {
        var c = Vector<double>.Build.Dense(Design.ColumnNames.Count);
        c[column] = 1;
        return Contrast(c, level);
    }
}
