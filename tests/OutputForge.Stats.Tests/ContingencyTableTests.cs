namespace OutputForge.Stats.Tests;

public class ContingencyTableTests
{
    /// <summary>
    /// Expected counts E = row total x column total / n worked by hand ("common practice", the
    /// definition in Agresti 2013, Categorical Data Analysis, section 3.2.1): for
    /// [[10, 20, 30], [20, 15, 5]] (n = 100, rows 60/40, columns 30/35/35) the expected counts are
    /// 18, 21, 21 / 12, 14, 14, so the minimum is 12 and no cell is below 5.
    /// </summary>
    [Fact]
    public void ExpectedCountsByHand()
    {
        var diagnostics = ContingencyTable.Diagnose(new[,] { { 10, 20, 30 }, { 20, 15, 5 } });
        Assert.Equal(12, diagnostics.MinimumExpected, 12);
        Assert.Equal(0, diagnostics.CellsBelowFive);
        Assert.Equal(6, diagnostics.CellCount);
    }

    /// <summary>[[3, 1], [1, 3]]: every expected count is 4 x 4 / 8 = 2.</summary>
    [Fact]
    public void SmallTableHasAllCellsBelowFive()
    {
        var diagnostics = ContingencyTable.Diagnose(new[,] { { 3, 1 }, { 1, 3 } });
        Assert.Equal(2, diagnostics.MinimumExpected, 12);
        Assert.Equal(4, diagnostics.CellsBelowFive);
        Assert.Equal(1.0, diagnostics.ShareBelowFive);
    }

    /// <summary>[[1, 200], [30, 40]]: E11 = 201 x 31 / 271 = 22.99, E21 = 70 x 31 / 271 = 8.007.</summary>
    [Fact]
    public void MinimumIsTheSmallestExpectedCount()
    {
        var diagnostics = ContingencyTable.Diagnose(new[,] { { 1, 200 }, { 30, 40 } });
        Assert.Equal(70.0 * 31 / 271, diagnostics.MinimumExpected, 12);
        Assert.Equal(0, diagnostics.CellsBelowFive);
    }

    [Fact]
    public void EmptyTableHasEveryCellBelowFive()
    {
        var diagnostics = ContingencyTable.Diagnose(new int[2, 3]);
        Assert.Equal(0, diagnostics.MinimumExpected);
        Assert.Equal(6, diagnostics.CellsBelowFive);
    }
}
