using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Tests.Layout;

public sealed class ColumnGroupHeaderTests
{
    private static readonly ResultColumn[] Columns =
    [
        new("placebo", "Placebo", 10), new("low", "Low", 10), new("high", "High", 10),
    ];

    [Fact]
    public void A_group_spans_its_adjacent_columns_and_other_columns_stay_empty()
    {
        var row = ColumnGroupHeader.Build(Columns, [new ColumnGroup("Active", ["low", "high"], "/g/0")]);

        Assert.NotNull(row);
        Assert.Equal(["", "", "Active"], row.Cells.Select(c => c.Text));
        Assert.Equal([1, 1, 2], row.Cells.Select(c => c.Span));
    }

    [Fact]
    public void A_group_whose_columns_are_apart_is_refused_with_its_location()
    {
        var e = Assert.Throws<ColumnGroupException>(() =>
            ColumnGroupHeader.Build(Columns, [new ColumnGroup("Odd", ["placebo", "high"], "/g/0")]));

        Assert.Equal("/g/0", e.Where);
        Assert.Contains("not next to each other", e.Message);
    }

    [Fact]
    public void An_arm_in_two_groups_is_refused()
    {
        Assert.Throws<ColumnGroupException>(() => ColumnGroupHeader.Build(Columns,
            [new ColumnGroup("A", ["low"], "/g/0"), new ColumnGroup("B", ["low", "high"], "/g/1")]));
    }

    [Fact]
    public void Groups_naming_no_column_of_the_table_add_no_row()
    {
        Assert.Null(ColumnGroupHeader.Build(Columns, [new ColumnGroup("Other", ["absent"], "/g/0")]));
    }

    [Fact]
    public void The_layout_puts_the_group_row_above_the_arm_labels()
    {
        var table = new TableResult("1", ["T"], "Pop", Columns, [], [], [], [], new TableProvenance("t.json", ["adsl"]));
        var run = new RunFacts(DateTimeOffset.UnixEpoch, "0", new Dictionary<string, string>());

        var document = TableLayoutBuilder.Build(table, "S", run, PageSettings.Default, groups: [new ColumnGroup("Active", ["low", "high"], "/g/0")]).Document;

        Assert.Equal(3, document.HeaderRows.Count);
        Assert.Equal("Active", document.HeaderRows[0].Cells[2].Text);
        Assert.Equal("Low", document.HeaderRows[1].Cells[2].Text);
    }
}
