namespace OutputForge.Stats.Tests;

/// <summary>
/// 2 x 2 x K methods against R 4.2.2 mantelhaen.test, the R package epiR 2.0.57 and statsmodels 0.13.5 StratifiedTable (values in
/// Oracles/ratio_strata_oracles.json). The "rabbits" data are the penicillin example of Agresti (1990,
/// Categorical Data Analysis, pp. 231-237) from R's mantelhaen.test documentation, whose corrected test
/// gives p = 0.047 there.
/// </summary>
public class StratifiedAnalysisTests
{
    public static IEnumerable<object[]> Sets() => new[] { "invented_three", "invented_sparse", "rabbits", "invented_heterogeneous" }.Select(s => new object[] { s });

    private static System.Text.Json.JsonElement Oracle(string set) => ReferenceOracles.RatioStrata.GetProperty("strata").GetProperty(set);

    [Theory]
    [MemberData(nameof(Sets))]
    public void CmhMatchesRWithAndWithoutCorrection(string set)
    {
        var strata = ReferenceOracles.Strata(set);
        var plain = CochranMantelHaenszelTest.Compute(strata);
        var corrected = CochranMantelHaenszelTest.Compute(strata, continuityCorrection: true);
        var r = Oracle(set).GetProperty("r_cmh");
        var rc = Oracle(set).GetProperty("r_cmh_corrected");
        Assert.Equal(r.GetProperty("statistic").GetDouble(), plain.Statistic!.Value, 1e-10);
        Assert.Equal(r.GetProperty("p").GetDouble(), plain.PValue, r.GetProperty("p").GetDouble() * 1e-9);
        Assert.Equal(rc.GetProperty("statistic").GetDouble(), corrected.Statistic!.Value, 1e-10);
        Assert.Equal(rc.GetProperty("p").GetDouble(), corrected.PValue, rc.GetProperty("p").GetDouble() * 1e-9);
    }

    [Fact]
    public void RabbitsCorrectedPValueIsTheDocumentedOne()
        => Assert.Equal(0.047, CochranMantelHaenszelTest.Compute(ReferenceOracles.Strata("rabbits"), true).PValue, 0.0005);

    [Theory]
    [MemberData(nameof(Sets))]
    public void MantelHaenszelOddsRatioMatchesR(string set)
    {
        var result = MantelHaenszelOddsRatio.Compute(ReferenceOracles.Strata(set));
        var r = Oracle(set).GetProperty("r_cmh");
        Assert.Equal(r.GetProperty("or").GetDouble(), result.Estimate, 1e-10);
        Assert.Equal(r.GetProperty("or_lower").GetDouble(), result.Lower, 1e-9);
        Assert.Equal(r.GetProperty("or_upper").GetDouble(), result.Upper, 1e-8);
    }

    [Theory]
    [MemberData(nameof(Sets))]
    public void MantelHaenszelRelativeRiskEstimateMatchesStatsmodels(string set)
    {
        var result = MantelHaenszelRelativeRisk.Compute(ReferenceOracles.Strata(set));
        Assert.Equal(Oracle(set).GetProperty("statsmodels").GetProperty("rr").GetDouble(), result.Estimate, 1e-12);
    }

    /// <summary>epiR 2.0.57 epi.2by2: RR.mh.wald (Greenland-Robins variance) and ARisk.mh.sato (Sato variance).</summary>
    [Theory]
    [MemberData(nameof(Sets))]
    public void RelativeRiskAndRiskDifferenceIntervalsMatchEpiR(string set)
    {
        var strata = ReferenceOracles.Strata(set);
        var epir = Oracle(set).GetProperty("epir");
        var rr = MantelHaenszelRelativeRisk.Compute(strata);
        Assert.Equal(epir.GetProperty("rr").GetDouble(), rr.Estimate, 1e-12);
        Assert.Equal(epir.GetProperty("rr_lower").GetDouble(), rr.Lower, 1e-10);
        Assert.Equal(epir.GetProperty("rr_upper").GetDouble(), rr.Upper, 1e-10);
        var rd = MantelHaenszelRiskDifference.Compute(strata);
        Assert.Equal(epir.GetProperty("rd").GetDouble(), rd.Estimate, 1e-12);
        Assert.Equal(epir.GetProperty("rd_lower").GetDouble(), rd.Lower, 1e-10);
        Assert.Equal(epir.GetProperty("rd_upper").GetDouble(), rd.Upper, 1e-10);
    }

    [Theory]
    [MemberData(nameof(Sets))]
    public void BreslowDayMatchesStatsmodels(string set)
    {
        var strata = ReferenceOracles.Strata(set);
        var sm = Oracle(set).GetProperty("statsmodels");
        var plain = BreslowDayTest.Compute(strata, taroneCorrection: false);
        var tarone = BreslowDayTest.Compute(strata);
        Assert.Equal(sm.GetProperty("breslow_day_statistic").GetDouble(), plain.Statistic!.Value, 1e-9);
        Assert.Equal(sm.GetProperty("breslow_day_p").GetDouble(), plain.PValue, 1e-9);
        Assert.Equal(sm.GetProperty("tarone_statistic").GetDouble(), tarone.Statistic!.Value, 1e-9);
        Assert.Equal(sm.GetProperty("tarone_p").GetDouble(), tarone.PValue, 1e-9);
    }

    [Fact]
    public void DegenerateStrataAreReportedInBreslowDay()
    {
        var result = BreslowDayTest.Compute(ReferenceOracles.Strata("rabbits"));
        Assert.Equal(2, result.DegreesOfFreedom);
        // Strata 1 and 5 of the rabbits data (indices 0 and 4) have a zero margin: no events, and every subject with the event.
        Assert.Equal([new StratumRemark(0, StratumRemarkReason.NoEvents, BreslowDayTest.MethodName),
            new StratumRemark(4, StratumRemarkReason.AllEvents, BreslowDayTest.MethodName)], result.StratumRemarks);
        Assert.Empty(result.Notes);
    }

    [Fact]
    public void EmptyStrataAreSkippedAndReported()
    {
        var strata = ReferenceOracles.Strata("invented_three");
        var withEmpty = new List<StratumCounts>(strata) { new(0, 0, 0, 0), new(3, 10, 0, 0) };
        var test = CochranMantelHaenszelTest.Compute(withEmpty);
        Assert.Equal(CochranMantelHaenszelTest.Compute(strata).Statistic, test.Statistic);
        StratumRemark[] skipped = [new(3, StratumRemarkReason.NoSubjects), new(4, StratumRemarkReason.EmptyGroup, Group: 2)];
        Assert.Equal(skipped, test.StratumRemarks);
        Assert.Empty(test.Notes);
        var or = MantelHaenszelOddsRatio.Compute(withEmpty);
        Assert.Equal(MantelHaenszelOddsRatio.Compute(strata).Estimate, or.Estimate);
        Assert.Equal(skipped, or.StratumRemarks);
        Assert.Equal(skipped, MantelHaenszelRiskDifference.Compute(withEmpty).StratumRemarks);
        Assert.Equal(skipped, MantelHaenszelRelativeRisk.Compute(withEmpty).StratumRemarks);
        Assert.Equal(skipped, BreslowDayTest.Compute(withEmpty).StratumRemarks.Take(2));
    }

    /// <summary>
    /// With a single stratum the Mantel-Haenszel odds ratio is the crude odds ratio ad/bc and the risk
    /// difference is p1 - p2 (definitions, Mantel and Haenszel 1959; Greenland and Robins 1985).
    /// </summary>
    [Fact]
    public void SingleStratumReducesToTheCrudeEstimates()
    {
        var one = new[] { new StratumCounts(12, 40, 5, 38) };
        Assert.Equal(12.0 * 33 / (28 * 5), MantelHaenszelOddsRatio.Compute(one).Estimate, 1e-12);
        Assert.Equal(12.0 / 40 - 5.0 / 38, MantelHaenszelRiskDifference.Compute(one).Estimate, 1e-12);
        Assert.Equal((12.0 / 40) / (5.0 / 38), MantelHaenszelRelativeRisk.Compute(one).Estimate, 1e-12);
    }

    [Fact]
    public void ZeroEventSumsAreNotEstimable()
    {
        var none = new[] { new StratumCounts(0, 10, 3, 12), new StratumCounts(0, 8, 1, 9) };
        Assert.False(MantelHaenszelOddsRatio.Compute(none).IsEstimable);
        Assert.False(MantelHaenszelRelativeRisk.Compute(none).IsEstimable);
        Assert.True(MantelHaenszelRiskDifference.Compute(none).IsEstimable);
    }
}
