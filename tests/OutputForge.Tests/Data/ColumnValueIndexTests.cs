using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// The shared index of a column's values (rows of each PARAMCD value, read once per run) and the compact numeric
/// columns: texts as written come back whether they were kept or rebuilt, including in columns that turn to text late.
/// </summary>
public sealed class ColumnValueIndexTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private Dataset Read(string content) => CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv", content));

    [Fact]
    public void Rows_of_each_value_are_in_row_order_and_values_in_first_seen_order()
    {
        var data = Read("USUBJID,PARAMCD,AVAL\nS1,B,1.0\nS1,A,2\nS2,B,\nS2,,3.25\nS3,A,-0.5\nS3,B,10\n");
        var paramcd = data.Get("PARAMCD");
        Assert.Equal(["B", "A"], paramcd.DistinctValues());
        Assert.Equal([0, 2, 5], paramcd.RowsWith("B"));
        Assert.Equal([1, 4], paramcd.RowsWith("A"));
        Assert.Empty(paramcd.RowsWith("C"));
        var aval = data.Get("AVAL");
        Assert.Equal(VariableKind.Number, aval.Kind);
        Assert.Equal(["1.0", "2", null, "3.25", "-0.5", "10"], Enumerable.Range(0, 6).Select(aval.GetText));
    }

    [Fact]
    public void Non_canonical_numbers_keep_their_text_and_a_late_text_value_keeps_every_earlier_text()
    {
        var data = Read("USUBJID,X,Y,Z\nS1,1e3,5.50,2026-01-02\nS2,+2, 7,2026-01-03\nS3,0.10,n/a,soon\n");
        var x = data.Get("X");
        Assert.Equal(VariableKind.Number, x.Kind);
        Assert.Equal(["1e3", "+2", "0.10"], Enumerable.Range(0, 3).Select(x.GetText));
        Assert.Equal(1000, x.GetNumber(0));
        var y = data.Get("Y");
        Assert.Equal(VariableKind.Text, y.Kind);
        Assert.Equal(["5.50", " 7", "n/a"], Enumerable.Range(0, 3).Select(y.GetText));
        Assert.Equal("'n/a' on line 4", y.TextEvidence);
        var z = data.Get("Z");
        Assert.Equal(VariableKind.Text, z.Kind);
        Assert.Equal(["2026-01-02", "2026-01-03", "soon"], Enumerable.Range(0, 3).Select(z.GetText));
        Assert.True(double.IsNaN(z.GetNumber(0)));
    }
}
