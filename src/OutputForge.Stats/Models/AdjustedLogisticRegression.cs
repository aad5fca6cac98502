using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Covariate-adjusted logistic regression of a binary endpoint on the treatment (control = its first level), class
/// covariates (reference coding) and numeric covariates, as an analysis: adjusted odds ratio of each active arm
/// against the control with the Wald interval exp(b -/+ z SE) and the profile-likelihood interval, the Wald and
/// likelihood-ratio p-values, the tests of the whole treatment term, and the marginal risk difference
/// (<see cref="MarginalRiskDifference"/>).
/// Maximum likelihood is fitted by <see cref="LogisticRegression"/> (R's glm.fit rules), so coefficients, standard
/// errors and deviance are those of R's glm; the profile likelihood and the one-coefficient likelihood-ratio tests use
/// constrained Newton fits from that estimate (<see cref="LogisticNewtonFit"/>), and the treatment-term test is the
/// deviance difference from the model without the treatment, as R's anova(test = "LRT").
/// When the responses are separated (Albert and Anderson 1984) the ML estimates do not exist; with
/// <see cref="LogisticEstimation.FirthWhenSeparated"/> Firth's (1993, Biometrika 80:27-38) penalized likelihood is used
/// instead, as Heinze and Schemper (2002, Stat Med 21:2409-2419) propose: estimates maximise
/// l(beta) + 1/2 log det I(beta), standard errors from I(beta^)^-1, intervals from the profile penalized likelihood,
/// tests are penalized likelihood-ratio tests (the penalty of the full model kept in the constrained fits), and a
/// note says so.
/// </summary>
public static class AdjustedLogisticRegression
{
    public const string LikelihoodRatioMethod = "Likelihood-ratio test (logistic regression)";
    public const string PenalizedLikelihoodRatioMethod = "Penalized likelihood-ratio test (Firth logistic regression)";
    public const string WaldMethod = "Wald chi-square test (logistic regression)";

    public static AdjustedLogisticResult Analyze(LogisticAnalysisData data, LogisticEstimation estimation = LogisticEstimation.FirthWhenSeparated,
        double level = 0.95)
    {
        ConfidenceLevel.Validate(level);
        var n = data.Count;
        if (data.Treatment.LevelOfRow.Count != n)
        {
            throw new ArgumentException($"{data.Treatment.LevelOfRow.Count} treatment values for {n} responses", nameof(data));
        }
        if (data.Treatment.Levels.Count < 2)
        {
            return AdjustedLogisticResult.NotEstimable(n, Separation.None, $"the treatment {data.Treatment.Name} has fewer than two levels");
        }
        var design = LinearModelDesign.Build(n, data.Covariates, [data.Treatment, .. data.Factors]);
        var first = design.FirstColumnOf(data.Treatment);
        var treatmentColumns = Enumerable.Range(first, data.Treatment.Levels.Count - 1).ToList();
        var x = design.Matrix;
        var y = Vector<double>.Build.Dense(n, i => data.Response[i]);
        var ml = LogisticRegression.Fit(data.Response, x.ToArray(), design.ColumnNames);
        if (!ml.IsEstimable)
        {
            return AdjustedLogisticResult.NotEstimable(n, Separation.None, ml.NotEstimableReason!);
        }
        var notes = new List<LogisticAnalysisNote>();
        var separated = ml.Separation != Separation.None;
        var firth = estimation == LogisticEstimation.Firth || (separated && estimation == LogisticEstimation.FirthWhenSeparated);
        if (separated && firth)
        {
            notes.Add(new LogisticAnalysisNote(LogisticNoteKind.SeparationFirthUsed,
                $"{SeparationText(ml)}: the maximum-likelihood estimates do not exist; Firth's penalized likelihood was used (Heinze and Schemper 2002)"));
        }
        else if (firth)
        {
            notes.Add(new LogisticAnalysisNote(LogisticNoteKind.FirthRequested, "Firth's penalized likelihood estimates (Firth 1993)"));
        }
        else if (separated)
        {
            return AdjustedLogisticResult.NotEstimable(n, ml.Separation,
                $"{SeparationText(ml)}: the maximum-likelihood estimates do not exist (Firth's penalized likelihood was not chosen)");
        }
        else if (!ml.Converged)
        {
            return AdjustedLogisticResult.NotEstimable(n, ml.Separation, $"the maximum-likelihood fit did not converge in {ml.Iterations} iterations");
        }

        // The reference of the profile and the one-coefficient tests: ML polished by Newton steps from R's estimate, or Firth's fit.
        var fit = LogisticNewtonFit.Fit(x, y, firth, start: firth ? null : Vector<double>.Build.DenseOfEnumerable(ml.Coefficients));
        if (!fit.Converged)
        {
            return AdjustedLogisticResult.NotEstimable(n, ml.Separation,
                $"the {(firth ? "penalized " : "")}likelihood maximisation did not converge in {fit.Iterations} iterations", notes);
        }
        var beta = firth ? fit.Beta : Vector<double>.Build.DenseOfEnumerable(ml.Coefficients);
        var covariance = firth ? fit.Covariance : Matrix<double>.Build.DenseOfArray(ml.Covariance);
        var z = ConfidenceLevel.NormalQuantile(level);
        var coefficients = design.ColumnNames.Select((name, j) =>
        {
            var se = Math.Sqrt(covariance[j, j]);
            return new LogisticCoefficient(name, beta[j], se, beta[j] / se, 2 * Normal.CDF(0, 1, -Math.Abs(beta[j] / se)));
        }).ToList();

        var lrMethod = firth ? PenalizedLikelihoodRatioMethod : LikelihoodRatioMethod;
        var comparisons = new List<AdjustedOddsRatio>();
        foreach (var column in treatmentColumns)
        {
            var c = coefficients[column];
            var wald = new IntervalResult(Math.Exp(c.Estimate), Math.Exp(c.Estimate - z * c.StandardError), Math.Exp(c.Estimate + z * c.StandardError));
            var limits = LogisticProfileInterval.Compute(x, y, firth, fit, column, level);
            var arm = data.Treatment.Levels[column - first + 1];
            IntervalResult profile;
            if (limits.Lower is { } lower && limits.Upper is { } upper)
            {
                profile = new IntervalResult(Math.Exp(c.Estimate), Math.Exp(lower), Math.Exp(upper));
            }
            else if (limits.Problem is { } problem)
            {
                var reason = $"profile {(firth ? "penalized " : "")}likelihood interval of {arm} vs {data.Treatment.Levels[0]}: {problem}";
                notes.Add(new LogisticAnalysisNote(LogisticNoteKind.NotConverged, reason));
                profile = IntervalResult.NotEstimable(reason);
            }
            else
            {
                var side = limits.Lower is null ? (limits.Upper is null ? "either" : "the lower") : "the upper";
                var reason = $"the profile {(firth ? "penalized " : "")}likelihood of {arm} vs {data.Treatment.Levels[0]} does not reach its bound on {side} side";
                notes.Add(new LogisticAnalysisNote(LogisticNoteKind.ProfileLimitUnbounded, reason));
                profile = IntervalResult.NotEstimable(reason);
            }
            var waldTest = new TestResult(WaldMethod, c.Z * c.Z, 1, c.WaldPValue);
            var lrTest = LogisticProfileInterval.Test(lrMethod, x, y, firth, fit, [column]);
            var (difference, riskArm, riskControl) = MarginalRiskDifference.Compute(x, beta, covariance, treatmentColumns, column, level);
            comparisons.Add(new AdjustedOddsRatio(arm, data.Treatment.Levels[0], wald, profile, waldTest, lrTest, difference, riskArm, riskControl));
        }

        var term = TermWaldTest(beta, covariance, treatmentColumns);
        TestResult termLr;
        if (firth)
        {
            termLr = LogisticProfileInterval.Test(lrMethod, x, y, true, fit, treatmentColumns);
        }
        else
        {
            var keep = Enumerable.Range(0, x.ColumnCount).Where(j => !treatmentColumns.Contains(j)).ToArray();
            var reducedX = Matrix<double>.Build.Dense(n, keep.Length, (i, k) => x[i, keep[k]]);
            var reduced = LogisticRegression.Fit(data.Response, reducedX.ToArray(), keep.Select(j => design.ColumnNames[j]).ToList());
            termLr = reduced.IsEstimable && reduced.Converged && reduced.Separation == Separation.None
                ? new TestResult(lrMethod, Math.Max(0, reduced.Deviance - ml.Deviance), treatmentColumns.Count,
                    MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(treatmentColumns.Count / 2.0, Math.Max(0, reduced.Deviance - ml.Deviance) / 2))
                : TestResult.NotEstimable(lrMethod, "model without the treatment: " + string.Join("; ", reduced.Problems));
        }
        var deviance = firth ? -2 * fit.LogLikelihood : ml.Deviance;
        return new AdjustedLogisticResult(firth, coefficients, comparisons, termLr, term, deviance, firth ? fit.Objective : null, n,
            firth ? fit.Iterations : ml.Iterations, ml.Separation, notes);
    }

    private static string SeparationText(LogisticRegressionFit fit) => fit.Separation == Separation.Complete
        ? "complete separation (every fitted probability is 0 or 1)"
        : $"quasi-complete separation ({fit.FittedAtBoundary} of {fit.Observations} fitted probabilities are 0 or 1)";

    /// <summary>The Wald chi-square of the treatment term, b_T' V_TT^-1 b_T on k - 1 degrees of freedom.</summary>
    private static TestResult TermWaldTest(Vector<double> beta, Matrix<double> covariance, IReadOnlyList<int> columns)
    {
        var b = Vector<double>.Build.Dense(columns.Count, k => beta[columns[k]]);
        var v = Matrix<double>.Build.Dense(columns.Count, columns.Count, (a, c) => covariance[columns[a], columns[c]]);
        var statistic = b * v.Cholesky().Solve(b);
        return new TestResult(WaldMethod, statistic, columns.Count, MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(columns.Count / 2.0, statistic / 2));
    }
}
