using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Tests.Layout;

/// <summary>Rows whose keys a kind built equal are told apart in table order, once, for every kind (docs/results.md, "Keys").</summary>
public sealed class RowKeyTieBreakTests
{
    [Fact]
    public void Levels_that_differ_only_in_case_get_the_tie_break_in_table_order_and_header_stays_the_column_ns()
    {
        ResultColumn[] columns = [new("placebo", "Placebo", 4)];
        ResultRow Row(string value) => new(ResultKey.Of("SEX", value), value, 1, [new ResultCell("placebo", "{n}", [StatisticValue.Count(StatisticNames.SubjectCount, 1)])]);
        ResultRow[] rows = [Row("F"), Row("f"), Row("M"), new(ResultKey.Part("Header"), "Header", 0, [new ResultCell("placebo", "{n}", [StatisticValue.Count(StatisticNames.SubjectCount, 2)])])];
        var table = new TableResult("1", ["T"], "Pop", columns, rows, [], [], [], new TableProvenance("t.json", ["adsl"]));
        var run = new RunFacts(DateTimeOffset.UnixEpoch, "0", new Dictionary<string, string>());

        var records = TableLayoutBuilder.Build(table, "S", run, PageSettings.Default).Records;

        Assert.Equal(["header", "sex/f", "sex/f_2", "sex/m", "header_2"], records.Select(r => r.Row));
        Assert.Equal(["(N=4)", "F", "f", "M", "Header"], records.Select(r => r.RowLabel));
        Assert.All(records, r => Assert.True(ResultKey.IsKey(r.Row), r.Row));
    }
}
