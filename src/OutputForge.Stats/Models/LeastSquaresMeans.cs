using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Least squares means of one class covariate (e.g. treatment) of a fitted linear model, and their
/// differences. Convention (documented in docs/statistics-models.md): each numeric covariate is set
/// to its observed mean over the observations in the fit, and every other class covariate is averaged
/// with equal weight 1/k over its k levels (the "balanced" LS mean, or population marginal mean, of
/// Searle, Speed and Milliken, The American Statistician 34, 1980; the default of R emmeans).
/// </summary>
public static class LeastSquaresMeans
{
    /// <summary>The coefficient vector c of the LS mean of <paramref name="level"/> of <paramref name="factor"/>.</summary>
    public static Vector<double> Weights(LinearModelDesign design, LinearModelFactor factor, string level)
    {
        var c = Vector<double>.Build.Dense(design.ColumnNames.Count);
        c[0] = 1;
        for (var k = 0; k < design.Covariates.Count; k++)
        {
            c[1 + k] = design.Covariates[k].Values.Average();
        }
        foreach (var f in design.Factors)
        {
            var first = design.FirstColumnOf(f);
            if (ReferenceEquals(f, factor))
            {
                var index = f.LevelIndex(level);
                if (index >= 1)
                {
                    c[first + index - 1] = 1;
                }
                continue;
            }
            for (var l = 1; l < f.Levels.Count; l++)
            {
                c[first + l - 1] = 1.0 / f.Levels.Count;
            }
        }
        return c;
    }

    public static LinearContrastResult Mean(LinearModelFit fit, LinearModelFactor factor, string level, double confidence) =>
        fit.Contrast(Weights(fit.Design, factor, level), confidence);

    /// <summary>LS mean of <paramref name="level"/> minus LS mean of <paramref name="reference"/>.</summary>
    public static LinearContrastResult Difference(LinearModelFit fit, LinearModelFactor factor, string level, string reference, double confidence) =>
        fit.Contrast(Weights(fit.Design, factor, level) - Weights(fit.Design, factor, reference), confidence);
}
