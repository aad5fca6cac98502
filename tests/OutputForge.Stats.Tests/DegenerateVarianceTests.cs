namespace OutputForge.Stats.Tests;

/// <summary>
/// A variance of rounding noise only (values all equal, or fitted exactly) is flagged, relative to the data's scale, so
/// that no standard error or p-value is made of it; real variation, even tiny against a large offset, is not.
/// </summary>
public sealed class DegenerateVarianceTests
{
    private static LinearModelFit TreatmentModel(IReadOnlyList<double> y, IReadOnlyList<double>? covariate = null)
    {
        var arms = new LinearModelFactor("treatment", ["P", "A"], y.Select((_, i) => i % 2).ToList());
        var covariates = covariate is null ? new List<LinearModelCovariate>() : [new LinearModelCovariate("BASE", covariate.ToList())];
        return LinearModel.Fit(y, LinearModelDesign.Build(y.Count, covariates, [arms]));
    }

    [Fact]
    public void Equal_values_leave_a_residual_variance_of_rounding_noise()
    {
        // -1.5 in every record with a covariate: the least-squares solution leaves residuals of a few units in the last
        // place, and a t test of them gives a p-value of pure noise (the case reported: p = 0.328).
        var baseline = Enumerable.Range(0, 40).Select(i => 3 + 0.37 * i).ToList();
        var fit = TreatmentModel(Enumerable.Repeat(-1.5, 40).ToList(), baseline);
        Assert.True(fit.IsEstimable);
        Assert.True(fit.HasDegenerateVariance);
    }

    [Fact]
    public void An_exact_linear_fit_is_degenerate()
    {
        var x = Enumerable.Range(0, 30).Select(i => 0.1 * i).ToList();
        var fit = TreatmentModel(x.Select((v, i) => 2 + 3 * v + (i % 2) * 0.5).ToList(), x);
        Assert.True(fit.HasDegenerateVariance);
    }

    [Fact]
    public void Real_variation_is_not_degenerate_even_on_a_large_offset()
    {
        // Variation of 1e-3 on values near 1e6: nine orders of magnitude below the values, far above rounding (1e-10).
        var y = Enumerable.Range(0, 40).Select(i => 1e6 + 1e-3 * ((i * 7) % 5)).ToList();
        Assert.False(TreatmentModel(y).HasDegenerateVariance);
    }

    [Theory]
    [InlineData(0, 0, 10, true)]
    [InlineData(1e-30, 1.0, 10, true)]
    [InlineData(1e-20, 1.0, 10, false)]
    [InlineData(1.0, 1.0, 10, false)]
    public void The_threshold_is_relative_to_the_scale(double sumOfSquares, double sumOfSquaredValues, int count, bool degenerate) =>
        Assert.Equal(degenerate, DegenerateVariance.Holds(sumOfSquares, sumOfSquaredValues, count));

    [Theory]
    [InlineData(3.3e-9, 1.7e-9)]
    [InlineData(-1.5, 2.25)]
    public void One_way_anova_of_constant_groups_is_not_estimable_on_both_summing_paths(double first, double second)
    {
        // Values below 1e-8 take the compensated floating-point sums, the others the exact decimal ones: both give a
        // within-group sum of squares of exactly zero for constant groups, so no F of rounding noise is formed.
        var groups = new List<IReadOnlyList<double>> { Enumerable.Repeat(first, 7).ToList(), Enumerable.Repeat(second, 5).ToList() };
        Assert.Equal(0, CentralMoments.Compute(groups[0]).SumOfSquares);
        var result = OneWayAnova.Compute(groups);
        Assert.False(result.IsEstimable);
        Assert.Contains("every group is constant", result.NotEstimableReason);
    }
}
