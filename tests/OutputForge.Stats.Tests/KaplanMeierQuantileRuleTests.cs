namespace OutputForge.Stats.Tests;

/// <summary>
/// The median's tie rules on small curves (flat at exactly 0.5, flat at 0.5 to the end, never reaching
/// 0.5) against R 4.2.2 survival 3.5.3 quantile(survfit(conf.type = "log-log")), block "smallCurves" of
/// efficacy_oracles.json.
/// </summary>
public sealed class KaplanMeierQuantileRuleTests
{
    public static TheoryData<int> Cases => new() { 0, 1, 2, 3, 4 };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Median_and_interval_follow_survfit(int index)
    {
        var block = EfficacyOracles.Root.GetProperty("smallCurves")[index];
        var times = block.GetProperty("times").EnumerateArray().Select(e => e.GetDouble()).ToList();
        var events = block.GetProperty("events").EnumerateArray().Select(e => e.GetDouble() == 1).ToList();
        var median = KaplanMeierEstimate.Compute(new SurvivalData(times, events)).Median();
        Assert.Equal(EfficacyOracles.Get(block, "median"), median.Estimate);
        Assert.Equal(EfficacyOracles.Get(block, "medianLower"), median.Lower);
        Assert.Equal(EfficacyOracles.Get(block, "medianUpper"), median.Upper);
    }

    [Fact]
    public void Estimates_beyond_the_last_observed_time_are_not_estimable()
    {
        var curve = KaplanMeierEstimate.Compute(new SurvivalData([2.0, 4, 6], [true, false, false]));
        Assert.False(curve.At(7).IsEstimable);
        // Before the first event S = 1 (hand computation); after it 2/3 (product-limit, Kaplan and Meier 1958).
        Assert.Equal(1.0, curve.At(1).Estimate);
        Assert.Equal(2.0 / 3, curve.At(5).Estimate, 15);
    }

    [Fact]
    public void Negative_times_are_rejected()
    {
        Assert.Throws<ArgumentException>(() => new SurvivalData([-1.0], [true]));
    }
}
