using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Tests.Layout;

/// <summary>Percent edges ("&lt;0.1", "&gt;99.9") and the zero-count rule of "n (%)" cells (common practice).</summary>
public sealed class PercentStyleTests
{
    [Theory]
    [InlineData(0.04, 1, "<0.1")]
    [InlineData(0.05, 1, "0.1")]
    [InlineData(0.0, 1, "0.0")]
    [InlineData(99.94, 1, "99.9")]
    [InlineData(99.95, 1, ">99.9")]
    [InlineData(100.0, 1, "100.0")]
    [InlineData(0.4, 0, "<1")]
    [InlineData(99.5, 0, ">99")]
    [InlineData(40.25, 1, "40.3")]
    public void Marks_percentages_that_would_round_to_0_or_100(double percent, int decimals, string expected)
    {
        Assert.Equal(expected, NumberText.PercentWithEdges(percent, decimals));
    }

    private static TableResult Table(PercentStyle? style) =>
        new("t", ["t"], "p", [], [], [], [], [], new TableProvenance("t.json", []), 1, 0.001, style);

    private static ResultCell Cell(string pattern, int n, int denominator, int? events = null)
    {
        var values = new List<StatisticValue>
        {
            StatisticValue.Count("n", n),
            StatisticValue.Count("N", denominator),
            new("percent", 100.0 * n / denominator, ValueFormat.Percent, 1),
        };
        if (events is { } e)
        {
            values.Add(StatisticValue.Count("events", e));
        }
        return new ResultCell("c", pattern, values);
    }

    [Fact]
    public void Edges_apply_only_when_the_table_asks()
    {
        var cell = Cell("{n} ({percent})", 1, 2000);
        Assert.Equal("1 (0.1)", CellText.Compose(cell, Table(null)).Text);
        Assert.Equal("1 (<0.1)", CellText.Compose(Cell("{n} ({percent})", 1, 2001), Table(new PercentStyle(EdgeMarks: true))).Text);
        Assert.Equal("1 (0.0)", CellText.Compose(Cell("{n} ({percent})", 1, 2001), Table(null)).Text);
        Assert.Equal("2000 (>99.9)", CellText.Compose(Cell("{n} ({percent})", 2000, 2001), Table(new PercentStyle(EdgeMarks: true))).Text);
    }

    [Fact]
    public void A_zero_count_shows_alone_in_every_n_percent_pattern_unless_the_table_asks_for_the_percentage()
    {
        Assert.Equal("0", CellText.Compose(Cell("{n} ({percent})", 0, 10), Table(null)).Text);
        Assert.Equal("0", CellText.Compose(Cell("{n} ({percent}%)", 0, 10), Table(null)).Text);
        Assert.Equal("0", CellText.Compose(Cell("{n} ({percent}) [{events}]", 0, 10, 0), Table(null)).Text);
        Assert.Equal("0 (0.0)", CellText.Compose(Cell("{n} ({percent})", 0, 10), Table(new PercentStyle(ZeroAsCountOnly: false))).Text);
        Assert.Equal("3 (30.0%)", CellText.Compose(Cell("{n} ({percent}%)", 3, 10), Table(null)).Text);
    }
}
