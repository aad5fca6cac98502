using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The marginal (standardized) risk difference of a logistic regression between an arm and the control (Ge, Durham,
/// Meyer, Xie and Thomas 2011, Drug Inf J 45:481-493; FDA 2023 guidance "Adjusting for Covariates in Randomized
/// Clinical Trials for Drugs and Biological Products"): every analysed subject is given the arm, then the control, and
/// the fitted probabilities are averaged, r_a = (1/n) sum_i expit(x_i(a)' beta); the estimate is r_a - r_c. Its
/// variance is by the delta method, d' V d with d = (1/n) sum_i [pi_i(a)(1 - pi_i(a)) x_i(a) - pi_i(c)(1 - pi_i(c)) x_i(c)]
/// and V the covariance of beta (the covariates are treated as fixed, as in Ge et al.), and the interval is
/// estimate -/+ z sqrt(d' V d).
/// </summary>
internal static class MarginalRiskDifference
{
    public static (IntervalResult Difference, double RiskArm, double RiskControl) Compute(Matrix<double> x, Vector<double> beta,
        Matrix<double> covariance, IReadOnlyList<int> treatmentColumns, int armColumn, double level)
    {
        var (riskArm, gradientArm) = Standardized(x, beta, treatmentColumns, armColumn);
        var (riskControl, gradientControl) = Standardized(x, beta, treatmentColumns, null);
        var d = gradientArm - gradientControl;
        var variance = d * covariance * d;
        var estimate = riskArm - riskControl;
        var half = ConfidenceLevel.NormalQuantile(level) * Math.Sqrt(Math.Max(0, variance));
        return (new IntervalResult(estimate, estimate - half, estimate + half), riskArm, riskControl);
    }

    /// <summary>The average fitted probability with every subject set to one arm (null: the control), and its gradient in beta.</summary>
    private static (double Risk, Vector<double> Gradient) Standardized(Matrix<double> x, Vector<double> beta, IReadOnlyList<int> treatmentColumns, int? armColumn)
    {
        var n = x.RowCount;
        var gradient = Vector<double>.Build.Dense(x.ColumnCount);
        double risk = 0;
        var row = Vector<double>.Build.Dense(x.ColumnCount);
        for (var i = 0; i < n; i++)
        {
            x.Row(i, row);
            foreach (var j in treatmentColumns)
            {
                row[j] = j == armColumn ? 1 : 0;
            }
            var pi = LogisticNewtonFit.Expit(row.DotProduct(beta));
            risk += pi;
            gradient.Add(row.Multiply(pi * (1 - pi)), gradient);
        }
        return (risk / n, gradient / n);
    }
}
