using OutputForge.Tests.Support;
using OutputForge.Workflow.Changes;

namespace OutputForge.Tests.Workflow;

/// <summary>Rows, columns and single numbers that appear or disappear between two runs, on hand-written results files.</summary>
public sealed class RunComparisonTests
{
    private static string Results(params string[] records) =>
        "{ \"study\": \"T1\", \"keyScheme\": 2, \"runTime\": \"2026-01-01T00:00:00Z\", \"tables\": [ { \"id\": \"1\" } ], \"records\": [" +
        string.Join(",", records) + "] }";

    private static string Record(string row, string column, string statistic, double value, string formatted) =>
        $"{{ \"table\": \"1\", \"row\": \"{row}\", \"column\": \"{column}\", \"statistic\": \"{statistic}\", \"value\": {value.ToString(System.Globalization.CultureInfo.InvariantCulture)}, \"formatted\": \"{formatted}\", \"rowLabel\": \"{row}\", \"columnLabel\": \"{column}\" }}";

    [Fact]
    public void AppearedAndDisappearedRowsColumnsAndNumbersAreTold()
    {
        using var folder = new TempFolder();
        var before = folder.Write("before/results.json", Results(
            Record("responders", "placebo", "n", 5, "5"),
            Record("responders", "active", "n", 7, "7"),
            Record("missing", "placebo", "n", 1, "1"),
            Record("p-value", "active", "pValue", 0.04, "0.040"),
            Record("p-value", "active", "statistic", 4.1, "4.100")));
        var after = folder.Write("after/results.json", Results(
            Record("responders", "placebo", "n", 5, "5"),
            Record("responders", "active", "n", 8, "8"),
            Record("responders", "total", "n", 13, "13"),
            Record("p-value", "active", "pValue", 0.0400000001, "0.040"),
            Record("evaluated", "placebo", "n", 4, "4")));

        var changes = RunComparison.Compare(Path.GetDirectoryName(before)!, Path.GetDirectoryName(after)!);

        var table = Assert.Single(changes.Tables);
        Assert.Equal(ChangeStatus.Changed, table.Status);
        Assert.Equal(["responders/active/n 7->8", "p-value/active/pValue 0.040->0.040"],
            table.Numbers.Select(n => $"{n.Before.Row}/{n.Before.Column}/{n.Before.Statistic} {n.Before.Formatted}->{n.After.Formatted}"));
        Assert.Equal(["evaluated"], table.RowsAdded);
        Assert.Equal(["missing"], table.RowsRemoved);
        Assert.Equal(["total"], table.ColumnsAdded);
        Assert.Empty(table.ColumnsRemoved);
        Assert.Empty(table.NumbersAdded);
        Assert.Equal(["p-value/active/statistic"], table.NumbersRemoved.Select(r => $"{r.Row}/{r.Column}/{r.Statistic}"));
        Assert.False(changes.InputsKnown);
    }
}
