using OutputForge.Layout;

namespace OutputForge.Tests.Layout;

/// <summary>Where a cell's first number ends, for the column alignment: numbers and a shell's placeholders alike.</summary>
public sealed class NumberAlignmentAnchorTests
{
    [Theory]
    [InlineData("112 (75.2)", 3)]
    [InlineData("x (xx.x)", 1)]
    [InlineData("xx", 2)]
    [InlineData("<0.001", 2)]
    [InlineData("0.xxx", 1)]
    [InlineData("(1.33, 2.51)", 2)]
    [InlineData("(x.x, x.x)", 2)]
    [InlineData("NE", 2)]
    public void The_anchor_follows_the_first_integer_part(string text, int anchor) =>
        Assert.Equal(anchor, NumberAlignment.Anchor(text));

    [Fact]
    public void Placeholder_counts_line_up_with_the_counts_of_n_percent_cells()
    {
        var rows = new[]
        {
            new BodyRow("n", 1, [new LayoutCell("x")]),
            new BodyRow("Better", 1, [new LayoutCell("x (xx.x)")]),
        };

        var aligned = NumberAlignment.Apply(rows);

        Assert.Equal("x" + new string(NumberAlignment.Pad, 7), aligned[0].Cells[0].Aligned);
    }
}
