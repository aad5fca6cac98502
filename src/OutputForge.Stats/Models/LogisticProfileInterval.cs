using MathNet.Numerics;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;

namespace OutputForge.Stats.Models;

/// <summary>
/// The profile (penalized) likelihood confidence interval of one logistic regression coefficient (Venzon and Moolgavkar
/// 1988, Appl Stat 37:87-94; for Firth's penalized likelihood Heinze and Schemper 2002, Stat Med 21:2409-2419,
/// section 2.2): the values b for which 2 [l(beta^) - max over the other coefficients of l(beta | beta_j = b)] stays
/// at most the chi-square(1) quantile of the level, l the log-likelihood or the penalized log-likelihood. Each limit is
/// bracketed by doubling steps of sqrt(q) SE from the estimate and then found by Brent's method; a side whose profile
/// does not reach the quantile within <see cref="MaximumReach"/> standard errors (the likelihood of a separated design
/// flattens towards infinity) has no finite limit. The same constrained fit at b = 0 gives the likelihood-ratio test.
/// </summary>
internal static class LogisticProfileInterval
{
    /// <summary>How far, in standard errors, a limit is looked for before the side is called unbounded.</summary>
    private const double MaximumReach = 1e4;
    private const double RootAccuracy = 1e-10;

    /// <summary>The limits on the coefficient's scale; null for a side without one, <paramref name="Problem"/> saying why when a constrained fit failed.</summary>
    public sealed record Limits(double? Lower, double? Upper, string? Problem = null);

    public static Limits Compute(Matrix<double> x, Vector<double> y, bool penalized, LogisticNewtonFit.Result full, int column, double level)
    {
        var quantile = ChiSquared.InvCDF(1, level);
        var estimate = full.Beta[column];
        var se = Math.Sqrt(full.Covariance[column, column]);
        string? problem = null;
        double Excess(double b)
        {
            var excess = Deviation(x, y, penalized, full, column, b) - quantile;
            if (double.IsNaN(excess))
            {
                problem = string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"the fit with the coefficient held at {b:G6} did not converge in {LogisticNewtonFit.MaximumIterations} iterations");
                throw new ArithmeticException(problem);
            }
            return excess;
        }
        double? Side(int direction)
        {
            var reach = Math.Sqrt(quantile) * se;
            var far = estimate + direction * reach;
            while (Excess(far) < 0)
            {
                reach *= 2;
                if (reach > MaximumReach * Math.Max(se, 1e-3))
                {
                    return null;
                }
                far = estimate + direction * reach;
            }
            var near = estimate + direction * reach / 2;
            if (Excess(near) >= 0)
            {
                near = estimate;
            }
            return Brent.FindRoot(Excess, Math.Min(near, far), Math.Max(near, far), RootAccuracy * Math.Max(1, Math.Abs(estimate)), 200);
        }
        try
        {
            return new Limits(Side(-1), Side(+1));
        }
        catch (ArithmeticException) when (problem is not null)
        {
            return new Limits(null, null, problem);
        }
    }

    /// <summary>2 [l(beta^) - l(beta~(b))], beta~(b) maximising l with coefficient <paramref name="column"/> held at b.</summary>
    public static double Deviation(Matrix<double> x, Vector<double> y, bool penalized, LogisticNewtonFit.Result full, int column, double b) =>
        Deviation(x, y, penalized, full, Enumerable.Range(0, x.ColumnCount).Select(j => j == column ? b : (double?)null).ToArray());

    /// <summary>2 [l(beta^) - max l] with the coefficients of <paramref name="fixedValues"/> held (null: free); NaN when that fit did not converge.</summary>
    public static double Deviation(Matrix<double> x, Vector<double> y, bool penalized, LogisticNewtonFit.Result full, IReadOnlyList<double?> fixedValues)
    {
        var constrained = LogisticNewtonFit.Fit(x, y, penalized, fixedValues, full.Beta);
        return constrained.Converged ? Math.Max(0, 2 * (full.Objective - constrained.Objective)) : double.NaN;
    }

    /// <summary>The likelihood-ratio (penalized likelihood-ratio for Firth) test of the coefficients of <paramref name="columns"/> being 0.</summary>
    public static TestResult Test(string method, Matrix<double> x, Vector<double> y, bool penalized, LogisticNewtonFit.Result full, IReadOnlyList<int> columns)
    {
        var fixedValues = Enumerable.Range(0, x.ColumnCount).Select(j => columns.Contains(j) ? 0 : (double?)null).ToArray();
        var statistic = Deviation(x, y, penalized, full, fixedValues);
        if (double.IsNaN(statistic))
        {
            return TestResult.NotEstimable(method, $"the fit under the null hypothesis did not converge in {LogisticNewtonFit.MaximumIterations} iterations");
        }
        return new TestResult(method, statistic, columns.Count, SpecialFunctions.GammaUpperRegularized(columns.Count / 2.0, statistic / 2));
    }
}
