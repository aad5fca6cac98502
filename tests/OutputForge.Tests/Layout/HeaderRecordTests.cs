using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Tests.Layout;

/// <summary>The column N of a table is a results record too; its labels are those the reader of the table sees (docs/results.md).</summary>
public sealed class HeaderRecordTests
{
    [Fact]
    public void Each_column_n_is_recorded_with_the_header_text_shown_above_it()
    {
        ResultColumn[] columns = [new("placebo", "Placebo", 149), new("qf-217-10-mg", "QF-217 10 mg", 151)];
        var table = new TableResult("14.2.1", ["T"], "Pop", columns, [], [], [], [], new TableProvenance("t.json", ["adsl"]));
        var run = new RunFacts(DateTimeOffset.UnixEpoch, "0", new Dictionary<string, string>());

        var laidOut = TableLayoutBuilder.Build(table, "S", run, PageSettings.Default);

        var shown = laidOut.Document.HeaderRows[^1].Cells.Skip(1).Select(c => c.Text).ToList();
        Assert.Equal(["(N=149)", "(N=151)"], shown);
        var records = laidOut.Records.Where(r => r.Row == "header").ToList();
        Assert.Equal(shown, records.Select(r => r.RowLabel));
        Assert.Equal(["Placebo", "QF-217 10 mg"], records.Select(r => r.ColumnLabel));
        Assert.Equal([149.0, 151.0], records.Select(r => r.Value!.Value));
        Assert.All(records, r => Assert.Equal("N", r.Statistic));
    }
}
