using MathNet.Numerics;

namespace OutputForge.Stats.Models;

/// <summary>
/// The likelihood-ratio test of a logistic model against a model nested in it (Wilks 1938; McCullagh
/// and Nelder 1989, section 4.4.3): G^2 = D_reduced - D_full, referred to chi-square with the
/// difference in the number of parameters as degrees of freedom, as R's anova(test = "LRT").
/// Not estimable when either fit is, or when either fit did not converge or shows separation: the
/// deviance then belongs to a limit, not to maximum-likelihood estimates, and the p-value would be
/// a number with no meaning.
/// </summary>
public static class LogisticLikelihoodRatioTest
{
    public const string MethodName = "Likelihood-ratio test (logistic regression)";

    public static TestResult Compute(LogisticRegressionFit reduced, LogisticRegressionFit full)
    {
        if (reduced.Observations != full.Observations)
        {
            throw new ArgumentException("the two models must be fitted to the same observations");
        }
        int df = full.Parameters - reduced.Parameters;
        if (df <= 0)
        {
            throw new ArgumentException("the full model must have more parameters than the reduced model");
        }
        var problems = reduced.Problems.Select(p => "model without the interaction: " + p)
            .Concat(full.Problems.Select(p => "model with the interaction: " + p)).ToList();
        if (problems.Count > 0)
        {
            return TestResult.NotEstimable(MethodName, string.Join("; ", problems));
        }
        double statistic = Math.Max(0, reduced.Deviance - full.Deviance);
        double p = SpecialFunctions.GammaUpperRegularized(df / 2.0, statistic / 2);
        return new TestResult(MethodName, statistic, df, p);
    }
}
