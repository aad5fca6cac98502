using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.Tests;

/// <summary>The tipping-point scan on an analysis whose answer is known by hand.</summary>
public sealed class TippingPointScanTests
{
    /// <summary>
    /// Estimate 0.5 - delta with standard error 0.2 and a two-sided normal p-value: significant at 0.05 while
    /// |0.5 - delta| / 0.2 &gt;= 1.959964, i.e. delta &lt;= 0.1080 (hand computation: 0.5 - 1.959964 x 0.2).
    /// </summary>
    private static (double Estimate, double PValue) Analysis(double delta)
    {
        var estimate = 0.5 - delta;
        return (estimate, 2 * Normal.CDF(0, 1, -Math.Abs(estimate) / 0.2));
    }

    [Fact]
    public void The_tipping_point_is_the_first_shift_that_loses_significance()
    {
        var result = TippingPointScan.Scan([0, 0.05, 0.1, 0.15, 0.2, 0.25], Analysis, 0.05);
        Assert.True(result.SignificantAtFirstShift);
        Assert.Equal(0.15, result.TippingShift);
        Assert.Equal(0.1, result.LastShiftKeepingConclusion);
        Assert.Equal([true, true, true, false, false, false], result.Rows.Select(r => r.Significant));
        // At delta = 0.1: z = 0.4 / 0.2 = 2, p = 0.0455 (standard normal table); at 0.15: z = 1.75, p = 0.0801.
        Assert.Equal(0.0455, result.Rows[2].PValue, 4);
        Assert.Equal(0.0801, result.Rows[3].PValue, 4);
        Assert.Empty(result.Notes);
    }

    [Fact]
    public void A_grid_where_the_conclusion_never_changes_has_no_tipping_point()
    {
        var result = TippingPointScan.Scan([0, 0.02, 0.04], Analysis, 0.05);
        Assert.Null(result.TippingShift);
        Assert.Null(result.LastShiftKeepingConclusion);
    }

    [Fact]
    public void A_conclusion_that_changes_back_is_told()
    {
        // Past delta = 0.5 the estimate turns negative and becomes significant again (|z| >= 1.96 from delta 0.892).
        var result = TippingPointScan.Scan([0, 0.3, 0.6, 0.9, 1.2], Analysis, 0.05);
        Assert.Equal(0.3, result.TippingShift);
        Assert.Single(result.Notes);
    }

    [Fact]
    public void An_unordered_grid_is_refused()
    {
        Assert.Throws<ArgumentException>(() => TippingPointScan.Scan([0, 0.2, 0.1], Analysis, 0.05));
    }
}
