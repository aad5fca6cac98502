namespace OutputForge.Stats.Tests;

/// <summary>Strata that carry no information are named, not silently used.</summary>
public sealed class LogRankStrataTests
{
    [Fact]
    public void A_stratum_with_one_group_only_is_reported_by_its_index()
    {
        // Stratum 1 holds group 0 only: with no comparison inside it, it adds nothing (Mantel 1966), and a reader must be told.
        var data = new SurvivalData([1.0, 2, 3, 4, 5, 6], [true, true, true, true, true, false]);
        var test = LogRankTest.Compute(data, [0, 1, 0, 1, 0, 0], [0, 0, 0, 0, 1, 1]);
        Assert.True(test.IsEstimable);
        Assert.Equal([new StratumRemark(1, StratumRemarkReason.OneGroupOnly)], test.StratumRemarks);
    }

    [Fact]
    public void Stratifying_on_a_stratum_without_events_gives_the_unstratified_result_of_the_others()
    {
        // Hand reasoning: a stratum with no events contributes no terms to O - E or V.
        var times = new[] { 1.0, 2, 3, 4, 7, 8 };
        var events = new[] { true, false, true, true, false, false };
        var group = new[] { 0, 1, 0, 1, 0, 1 };
        var stratified = LogRankTest.Compute(new SurvivalData(times, events), group, [0, 0, 0, 0, 1, 1]);
        var firstOnly = LogRankTest.Compute(new SurvivalData(times[..4], events[..4]), group[..4]);
        Assert.Equal(firstOnly.Statistic!.Value, stratified.Statistic!.Value, 14);
        Assert.Equal([new StratumRemark(1, StratumRemarkReason.NoEvents)], stratified.StratumRemarks);
    }
}
