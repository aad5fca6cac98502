namespace OutputForge.Stats.Tests;

/// <summary>Fits that must report instead of printing a number (monotone likelihood, no events).</summary>
public sealed class CoxProportionalHazardsEdgeTests
{
    [Fact]
    public void An_arm_without_events_gives_no_hazard_ratio()
    {
        // Every event is in group 1: the partial likelihood increases without bound as b -> infinity
        // (monotone likelihood; Bryson and Johnson, Biometrika 68, 1981). R's coxph warns that the
        // coefficient may be infinite; here the fit is not estimable and says why.
        var data = new SurvivalData([1.0, 2, 3, 4, 5, 6, 7, 8], [true, true, true, true, false, false, false, false]);
        var x = new double[8, 1];
        for (var i = 0; i < 4; i++)
        {
            x[i, 0] = 1;
        }
        var fit = CoxProportionalHazards.Fit(data, x);
        Assert.False(fit.IsEstimable);
        Assert.False(fit.HazardRatio(0, 0.95).IsEstimable);
        Assert.False(string.IsNullOrEmpty(fit.NotEstimableReason));
    }

    [Fact]
    public void No_events_gives_no_fit()
    {
        var fit = CoxProportionalHazards.Fit(new SurvivalData([1.0, 2], [false, false]), new double[,] { { 0 }, { 1 } });
        Assert.False(fit.IsEstimable);
        Assert.Contains("no events", fit.NotEstimableReason);
    }

    [Fact]
    public void A_log_rank_test_with_one_group_is_not_estimable()
    {
        var test = LogRankTest.Compute(new SurvivalData([1.0, 2], [true, true]), [0, 0]);
        Assert.False(test.IsEstimable);
    }
}
