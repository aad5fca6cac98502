namespace OutputForge.Stats.Tests;

public class RatioIntervalTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.RatioStrata.GetProperty("two_groups").EnumerateArray().Select(r => new object[]
    {
        r.GetProperty("events1").GetInt32(), r.GetProperty("n1").GetInt32(), r.GetProperty("events2").GetInt32(), r.GetProperty("n2").GetInt32(),
    });

    private static System.Text.Json.JsonElement Row(int e1, int n1, int e2, int n2) => ReferenceOracles.RatioStrata.GetProperty("two_groups").EnumerateArray()
        .Single(r => r.GetProperty("events1").GetInt32() == e1 && r.GetProperty("n1").GetInt32() == n1 && r.GetProperty("events2").GetInt32() == e2 && r.GetProperty("n2").GetInt32() == n2);

    /// <summary>
    /// statsmodels 0.13.5 Table2x2.riskratio_confint(method = "normal"), the log (Katz) interval.
    /// statsmodels adds 0.5 to every cell of a table with a zero cell (shift_zeros), so such rows are
    /// checked by hand instead (RelativeRiskWithAllEventsInOneGroup).
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void RelativeRiskMatchesStatsmodels(int e1, int n1, int e2, int n2)
    {
        if (e1 == n1 || e2 == n2 || e1 == 0 || e2 == 0)
        {
            return;
        }
        var row = Row(e1, n1, e2, n2);
        var result = RelativeRisk.Compute(e1, n1, e2, n2);
        Assert.Equal(row.GetProperty("rr").GetDouble(), result.Estimate, 1e-12);
        Assert.Equal(row.GetProperty("rr_lower").GetDouble(), result.Lower, 1e-10);
        Assert.Equal(row.GetProperty("rr_upper").GetDouble(), result.Upper, 1e-10);
    }

    /// <summary>statsmodels 0.13.5 Table2x2.oddsratio_confint(method = "normal"), the Woolf logit interval.</summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void OddsRatioMatchesStatsmodels(int e1, int n1, int e2, int n2)
    {
        var row = Row(e1, n1, e2, n2);
        var result = OddsRatio.Compute(e1, n1, e2, n2);
        if (e1 == n1 || e2 == n2 || e1 == 0 || e2 == 0)
        {
            Assert.False(result.IsEstimable);
            return;
        }
        Assert.Equal(row.GetProperty("or").GetDouble(), result.Estimate, 1e-10);
        Assert.Equal(row.GetProperty("or_lower").GetDouble(), result.Lower, 1e-10);
        Assert.Equal(row.GetProperty("or_upper").GetDouble(), result.Upper, 1e-9);
    }

    /// <summary>
    /// 30/30 vs 20/25: RR = 1 / 0.8 = 1.25 and var ln RR = 1/30 - 1/30 + 1/20 - 1/25 = 0.01 (Katz
    /// formula by hand), so the 95% limits are 1.25 exp(-/+ 1.959964 x 0.1).
    /// </summary>
    [Fact]
    public void RelativeRiskWithAllEventsInOneGroup()
    {
        var result = RelativeRisk.Compute(30, 30, 20, 25);
        Assert.Equal(1.25, result.Estimate, 1e-12);
        Assert.Equal(1.25 * Math.Exp(-1.959963984540054 * 0.1), result.Lower, 1e-12);
        Assert.Equal(1.25 * Math.Exp(1.959963984540054 * 0.1), result.Upper, 1e-12);
    }

    [Fact]
    public void ZeroCellsAreNotEstimableUnlessTheCorrectionIsAsked()
    {
        Assert.False(RelativeRisk.Compute(0, 20, 3, 20).IsEstimable);
        Assert.False(OddsRatio.Compute(20, 20, 3, 20).IsEstimable);
        var corrected = OddsRatio.Compute(20, 20, 3, 20, addHalfWhenZero: true);
        // Haldane: (20.5 x 17.5) / (0.5 x 3.5), worked by hand.
        Assert.Equal(20.5 * 17.5 / (0.5 * 3.5), corrected.Estimate, 1e-9);
        Assert.NotEmpty(corrected.Notes);
        var rr = RelativeRisk.Compute(0, 20, 3, 20, addHalfWhenZero: true);
        Assert.Equal((0.5 / 21) / (3.5 / 21), rr.Estimate, 1e-12);
        Assert.NotEmpty(rr.Notes);
    }

    [Fact]
    public void EmptyGroupIsNotEstimableAndBadCountsThrow()
    {
        Assert.False(RelativeRisk.Compute(0, 0, 3, 20).IsEstimable);
        Assert.False(OddsRatio.Compute(3, 20, 0, 0).IsEstimable);
        Assert.Throws<ArgumentOutOfRangeException>(() => RelativeRisk.Compute(21, 20, 3, 20));
        Assert.Throws<ArgumentOutOfRangeException>(() => OddsRatio.Compute(1, 20, 3, 20, level: 0));
    }
}
