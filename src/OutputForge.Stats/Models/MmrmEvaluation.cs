using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The (restricted) log-likelihood of a mixed model for repeated measures at one value of the
/// covariance parameters theta: beta(theta), Phi = (X'V^-1 X)^-1, the residuals, and (when derivatives
/// were asked for) the gradient, the expected and observed information of theta, and
/// M_j = X'V^-1 V_j V^-1 X = -dPhi^-1/dtheta_j.
/// </summary>
internal sealed class MmrmEvaluation(Vector<double> theta, double logLikelihood, Vector<double> beta, Matrix<double> phi, Vector<double> residuals)
{
    public Vector<double> Theta { get; } = theta;
    public double LogLikelihood { get; } = logLikelihood;
    public Vector<double> Beta { get; } = beta;
    public Matrix<double> Phi { get; } = phi;
    public Vector<double> Residuals { get; } = residuals;
    public Vector<double>? Gradient { get; set; }
    public Matrix<double>? ExpectedInformation { get; set; }
    public Matrix<double>? ObservedInformation { get; set; }
    public Matrix<double>[]? M { get; set; }
}
