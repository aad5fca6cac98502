using OutputForge.Layout;

namespace OutputForge.Tests.Layout;

public sealed class NumberAlignmentTests
{
    private static IReadOnlyList<string> AlignColumn(params string[] texts)
    {
        var rows = texts.Select(t => new BodyRow("r", 0, [new LayoutCell(t)])).ToList();
        return NumberAlignment.Apply(rows).Select(r => r.Cells[0].Display.Replace(NumberAlignment.Pad, '.')).ToList();
    }

    [Fact]
    public void Counts_with_percentages_align_on_the_opening_parenthesis_and_have_one_length()
    {
        var aligned = AlignColumn("37 (24.8)", "112 (75.2)", "0", "26");

        Assert.Equal([".37 (24.8)", "112 (75.2)", "..0.......", ".26......."], aligned);
        Assert.Single(aligned.Select(a => a.IndexOf('(')).Where(i => i >= 0).Distinct());
    }

    [Fact]
    public void Estimates_intervals_and_p_values_align_on_the_decimal_point()
    {
        var aligned = AlignColumn("20.5", "(9.7, 30.6)", "<0.001", "-2.0");

        // The first number's units digit stands in one position: index 2 in every text.
        Assert.Equal(["20.5.......", "(9.7, 30.6)", "<0.001.....", "-2.0......."], aligned);
    }

    [Fact]
    public void Empty_and_multi_line_cells_are_left_alone()
    {
        var rows = new List<BodyRow>
        {
            new("a", 0, [LayoutCell.Empty]), new("b", 0, [new LayoutCell("1\n2")]), new("c", 0, [new LayoutCell("10")]),
        };

        var aligned = NumberAlignment.Apply(rows);

        Assert.All(aligned, r => Assert.Null(r.Cells[0].Aligned));
    }

    [Fact]
    public void The_unpadded_text_stays_for_the_spreadsheet()
    {
        var rows = new List<BodyRow> { new("a", 0, [new LayoutCell("5", 5, "0")]), new("b", 0, [new LayoutCell("100", 100, "0")]) };

        var cell = NumberAlignment.Apply(rows)[0].Cells[0];

        Assert.Equal("5", cell.Text);
        Assert.Equal(5, cell.Number);
        Assert.Equal("\u00A0\u00A05", cell.Display);
    }
}
