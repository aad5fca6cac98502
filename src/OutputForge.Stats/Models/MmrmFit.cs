using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// A fitted mixed model for repeated measures: fixed-effect estimates with their model-based covariance
/// Phi = (X'V^-1 X)^-1, the covariance parameters and Sigma, the (restricted) log-likelihood, notes on
/// convergence and on the estimated covariance, or why the model could not be fitted. Tests and
/// intervals take the denominator degrees of freedom method as an argument (docs/methods.md).
/// </summary>
public sealed class MmrmFit
{
    private readonly MmrmData? _data;
    private readonly MmrmLikelihood? _likelihood;
    private readonly MmrmEvaluation? _estimate;
    private readonly List<string> _notes = [];
    private readonly Lazy<(KenwardRogerAdjustment? Adjustment, string? Reason)> _kenwardRoger;
    private readonly Matrix<double>? _observedInverse;

    internal MmrmFit(MmrmData data, MmrmDesign design, WithinSubjectCovariance covariance, MmrmEstimationMethod method,
        MmrmLikelihood likelihood, MmrmEvaluation estimate, int iterations, bool converged)
    {
        _data = data;
        Design = design;
        CovarianceModel = covariance;
        Method = method;
        _likelihood = likelihood;
        _estimate = estimate;
        Iterations = iterations;
        Converged = converged;
        var what = method == MmrmEstimationMethod.RestrictedMaximumLikelihood ? "REML" : "maximum likelihood";
        if (!converged)
        {
            _notes.Add($"The {what} fit with {Mmrm.Describe(covariance.Structure)} covariance did not converge (stopped after {iterations} iterations); results are from the last iterate.");
        }
        var sigma = Sigma;
        var scale = Matrix<double>.Build.DenseOfDiagonalVector(sigma.Diagonal().Map(v => 1 / Math.Sqrt(v)));
        var smallest = (scale * sigma * scale).Evd(Symmetricity.Symmetric).EigenValues.Real().Min();
        if (smallest < 1e-6)
        {
            _notes.Add($"The estimated {Mmrm.Describe(covariance.Structure)} covariance matrix is nearly singular (smallest correlation eigenvalue {smallest:G3}): the estimate is at the edge of the parameter space.");
        }
        if (MmrmLikelihood.PositiveDefinite(estimate.ObservedInformation!))
        {
            _observedInverse = estimate.ObservedInformation!.Inverse();
        }
        else
        {
            _notes.Add("The observed information of the covariance parameters is not positive definite: Satterthwaite degrees of freedom are not estimable.");
        }
        _kenwardRoger = new Lazy<(KenwardRogerAdjustment?, string?)>(BuildKenwardRoger);
    }

    private MmrmFit(MmrmDesign design, WithinSubjectCovariance covariance, MmrmEstimationMethod method, string reason)
    {
        Design = design;
        CovarianceModel = covariance;
        Method = method;
        NotEstimableReason = reason;
        _kenwardRoger = new Lazy<(KenwardRogerAdjustment?, string?)>(() => (null, reason));
    }

    internal static MmrmFit NotEstimable(MmrmDesign design, WithinSubjectCovariance covariance, MmrmEstimationMethod method, string reason) =>
        new(design, covariance, method, reason);

    public MmrmDesign Design { get; }
    public WithinSubjectCovariance CovarianceModel { get; }
    public MmrmCovarianceStructure Structure => CovarianceModel.Structure;
    public MmrmEstimationMethod Method { get; }
    public int Iterations { get; }
    public bool Converged { get; }
    public string? NotEstimableReason { get; }
    public bool IsEstimable => NotEstimableReason is null;

    /// <summary>Non-convergence, a covariance at the edge of its parameter space, a singular information matrix.</summary>
    public IReadOnlyList<string> Notes => _notes;

    private MmrmEvaluation Estimate => _estimate ?? throw new InvalidOperationException(NotEstimableReason);

    /// <summary>The REML log-likelihood (with the (N - p) log 2pi constant) or the ML log-likelihood.</summary>
    public double LogLikelihood => Estimate.LogLikelihood;

    public Vector<double> Coefficients => Estimate.Beta;

    /// <summary>Phi = (X'V^-1 X)^-1 at the estimated theta, the model-based covariance of the estimates.</summary>
    public Matrix<double> Covariance => Estimate.Phi;

    public Vector<double> CovarianceParameters => Estimate.Theta;

    /// <summary>The estimated within-subject covariance matrix over all visits.</summary>
    public Matrix<double> Sigma => CovarianceModel.Sigma(Estimate.Theta);

    /// <summary>Kenward and Roger's adjusted covariance Phi_A, or null (with the reason) where it cannot be formed.</summary>
    public Matrix<double>? KenwardRogerCovariance => _kenwardRoger.Value.Adjustment?.AdjustedCovariance;

    public string? KenwardRogerNotEstimableReason => _kenwardRoger.Value.Reason;

    public int ResidualDegreesOfFreedom => _likelihood is null ? 0 : _likelihood.ObservationCount - _likelihood.ColumnCount;

    public double StandardError(int column) => Math.Sqrt(Covariance[column, column]);

    /// <summary>c'beta with its standard error, df, two-sided interval at <paramref name="level"/>, t and p.</summary>
    public MmrmContrastResult Contrast(Vector<double> c, MmrmDegreesOfFreedom dfMethod, double level)
    {
        if (!IsEstimable)
        {
            return MmrmContrastResult.NotEstimable(NotEstimableReason!);
        }
        var estimate = c.DotProduct(Coefficients);
        double variance;
        double df;
        switch (dfMethod)
        {
            case MmrmDegreesOfFreedom.KenwardRoger:
                var (kr, reason) = _kenwardRoger.Value;
                if (kr is null)
                {
                    return MmrmContrastResult.NotEstimable(reason!);
                }
                variance = c.DotProduct(kr.AdjustedCovariance * c);
                df = kr.Test(Matrix<double>.Build.DenseOfRowVectors(c)).DegreesOfFreedom;
                break;
            case MmrmDegreesOfFreedom.Satterthwaite:
                if (_observedInverse is null)
                {
                    return MmrmContrastResult.NotEstimable("Satterthwaite degrees of freedom need a positive definite observed information of the covariance parameters");
                }
                variance = c.DotProduct(Covariance * c);
                df = SatterthwaiteDegreesOfFreedom.Single(c, Covariance, Estimate.M!, _observedInverse);
                break;
            default:
                variance = c.DotProduct(Covariance * c);
                df = ContainmentDegreesOfFreedom(c, dfMethod);
                break;
        }
        if (!(variance > 0))
        {
            return MmrmContrastResult.NotEstimable("the contrast has zero variance");
        }
        if (!(df > 0) || !double.IsFinite(df))
        {
            return MmrmContrastResult.NotEstimable($"the {Describe(dfMethod)} degrees of freedom are not positive and finite");
        }
        var se = Math.Sqrt(variance);
        var quantile = StudentT.InvCDF(0, 1, df, 1 - (1 - level) / 2);
        var t = estimate / se;
        var p = 2 * StudentT.CDF(0, 1, df, -Math.Abs(t));
        return new MmrmContrastResult(estimate, se, df, estimate - quantile * se, estimate + quantile * se, t, p);
    }

    /// <summary>The LS mean at the given class levels (others weighted equally, covariates at their means).</summary>
    public MmrmContrastResult LeastSquaresMean(IReadOnlyDictionary<string, string> levels, MmrmDegreesOfFreedom dfMethod, double level) =>
        Contrast(Design.LeastSquaresMeanWeights(levels), dfMethod, level);

    /// <summary>LS mean at <paramref name="levels"/> minus LS mean at <paramref name="reference"/>.</summary>
    public MmrmContrastResult LeastSquaresMeanDifference(IReadOnlyDictionary<string, string> levels,
        IReadOnlyDictionary<string, string> reference, MmrmDegreesOfFreedom dfMethod, double level) =>
        Contrast(Design.LeastSquaresMeanWeights(levels) - Design.LeastSquaresMeanWeights(reference), dfMethod, level);

    /// <summary>
    /// The F test of L beta = 0: Wald statistic / q with Phi (Satterthwaite, residual, between-within) or
    /// lambda times that with Phi_A (Kenward-Roger).
    /// </summary>
    public MmrmFTestResult Test(string name, Matrix<double> l, MmrmDegreesOfFreedom dfMethod)
    {
        var q = l.RowCount;
        if (!IsEstimable)
        {
            return MmrmFTestResult.NotEstimable(name, q, NotEstimableReason!);
        }
        var lb = l * Coefficients;
        double f;
        double df;
        switch (dfMethod)
        {
            case MmrmDegreesOfFreedom.KenwardRoger:
                var (kr, reason) = _kenwardRoger.Value;
                if (kr is null)
                {
                    return MmrmFTestResult.NotEstimable(name, q, reason!);
                }
                var (m, lambda) = kr.Test(l);
                f = lambda * lb.DotProduct((l * kr.AdjustedCovariance * l.Transpose()).Solve(lb)) / q;
                df = m;
                break;
            case MmrmDegreesOfFreedom.Satterthwaite:
                if (_observedInverse is null)
                {
                    return MmrmFTestResult.NotEstimable(name, q, "Satterthwaite degrees of freedom need a positive definite observed information of the covariance parameters");
                }
                f = lb.DotProduct((l * Covariance * l.Transpose()).Solve(lb)) / q;
                df = SatterthwaiteDegreesOfFreedom.Multiple(l, Covariance, Estimate.M!, _observedInverse);
                break;
            default:
                f = lb.DotProduct((l * Covariance * l.Transpose()).Solve(lb)) / q;
                df = Enumerable.Range(0, q).Min(k => ContainmentDegreesOfFreedom(l.Row(k), dfMethod));
                break;
        }
        if (!(df > 0) || !double.IsFinite(df))
        {
            return MmrmFTestResult.NotEstimable(name, q, $"the {Describe(dfMethod)} denominator degrees of freedom are not positive and finite");
        }
        return new MmrmFTestResult(name, q, df, f, 1 - FisherSnedecor.CDF(q, df, f));
    }

    /// <summary>
    /// Type 3 tests of each term: the term's coefficients are zero when the model is coded with sum-to-zero
    /// contrasts (each effect averaged with equal weights over the levels of the factors it interacts
    /// with; numeric covariates at zero). The hypothesis rows are carried to the reported coding by
    /// X_sum = X_reference T, i.e. L = E_term T^-1.
    /// </summary>
    public IReadOnlyList<MmrmFTestResult> Type3Tests(MmrmDegreesOfFreedom dfMethod)
    {
        var toReference = Design.SumCoded.QR().Solve(Design.ReferenceCoded);
        var results = new List<MmrmFTestResult>();
        for (var t = 0; t < Design.Terms.Count; t++)
        {
            var columns = Design.ColumnsOf(t);
            var name = Design.Terms[t].Name;
            if (columns.Count == 0)
            {
                results.Add(MmrmFTestResult.NotEstimable(name, 0, $"{name} has no columns (a class covariate with one level)"));
                continue;
            }
            var l = Matrix<double>.Build.DenseOfRowVectors(columns.Select(j => toReference.Row(j)));
            results.Add(Test(name, l, dfMethod));
        }
        return results;
    }

    /// <summary>
    /// Residual: N - p. Between-within (common practice; recalled from memory): a contrast that involves
    /// any column varying within subjects gets N - S - (p - p_between), otherwise S - p_between, with S
    /// subjects and p_between columns constant within every subject.
    /// </summary>
    private double ContainmentDegreesOfFreedom(Vector<double> c, MmrmDegreesOfFreedom dfMethod)
    {
        var n = _likelihood!.ObservationCount;
        var p = _likelihood.ColumnCount;
        if (dfMethod == MmrmDegreesOfFreedom.Residual)
        {
            return n - p;
        }
        var within = Design.WithinSubjectColumns(_data!.Subject);
        var subjects = _data.Subject.Distinct(StringComparer.Ordinal).Count();
        var between = within.Count(w => !w);
        var usesWithin = Enumerable.Range(0, c.Count).Any(j => within[j] && Math.Abs(c[j]) > 1e-12);
        return usesWithin ? n - subjects - (p - between) : subjects - between;
    }

    private (KenwardRogerAdjustment?, string?) BuildKenwardRoger()
    {
        if (Method != MmrmEstimationMethod.RestrictedMaximumLikelihood)
        {
            return (null, "Kenward-Roger degrees of freedom are defined for REML fits");
        }
        var expected = Estimate.ExpectedInformation!;
        if (!MmrmLikelihood.PositiveDefinite(expected))
        {
            return (null, "the expected information of the covariance parameters is not positive definite: Kenward-Roger is not estimable");
        }
        var (q, r) = _likelihood!.KenwardRogerTerms(Estimate.Theta);
        var adjustment = KenwardRogerAdjustment.Create(Covariance, Estimate.M!, expected.Inverse(), q, r);
        if (!MmrmLikelihood.PositiveDefinite(adjustment.AdjustedCovariance))
        {
            return (null, "the Kenward-Roger adjusted covariance of the estimates is not positive definite");
        }
        return (adjustment, null);
    }

    private static string Describe(MmrmDegreesOfFreedom method) => method switch
    {
        MmrmDegreesOfFreedom.KenwardRoger => "Kenward-Roger",
        MmrmDegreesOfFreedom.Satterthwaite => "Satterthwaite",
        MmrmDegreesOfFreedom.Residual => "residual",
        _ => "between-within",
    };
}
