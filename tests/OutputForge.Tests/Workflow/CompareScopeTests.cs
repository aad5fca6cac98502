using OutputForge.Workflow;

namespace OutputForge.Tests.Workflow;

/// <summary>`compare` counts production numbers only in the tables a QC file names, and says what is wrong with a QC line's place.</summary>
public sealed class CompareScopeTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    private static string Csv(string text) => text.Contains(',') || text.Contains('"') ? "\"" + text.Replace("\"", "\"\"") + "\"" : text;

    private static string Line(RunRecord record, string column) =>
        $"{Csv(record.Table)},{Csv(record.Row)},{Csv(column)},{Csv(record.Statistic)},{Csv(record.Formatted)}";

    [Fact]
    public void Only_in_production_counts_the_tables_the_qc_file_names_and_says_so()
    {
        var results = RunResults.Read(demo.Before);
        var first = results.Records.First(r => r.Statistic == "n");
        var qc = demo.Write("qc-one-table.csv", "table,row,column,statistic,value\n" + Line(first, first.Column) + "\n");

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.True(code == 0, output + error);
        var inTable = results.Records.Count(r => r.Table == first.Table);
        var otherTables = results.Records.Select(r => r.Table).Distinct().Count() - 1;
        Assert.True(otherTables > 0);
        Assert.StartsWith($"matched 1, mismatched 0, only in production {inTable - 1} (in the 1 table the QC file names; " +
                          $"{otherTables} tables it does not name are not counted), only in QC 0", output);
    }

    [Fact]
    public void A_column_of_the_table_that_a_row_has_no_number_in_is_named_as_such()
    {
        var results = RunResults.Read(demo.Before);
        // A row with fewer columns than its table (e.g. a p-value row), and a column of the table it lacks.
        var (row, missing) = results.Records.GroupBy(r => (r.Table, r.Row))
            .Select(g => (Row: g.First(), Missing: results.Records.Where(r => r.Table == g.Key.Table)
                .Select(r => r.Column).Distinct().Except(g.Select(r => r.Column)).FirstOrDefault()))
            .First(x => x.Missing is not null);
        var qc = demo.Write("qc-wrong-column.csv", "table,row,column,statistic,value\n" + Line(row, missing!) + "\n");

        var (code, output, _) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.Equal(2, code);
        var columns = string.Join(", ", results.Records.Where(r => r.Table == row.Table && r.Row == row.Row).Select(r => r.Column).Distinct());
        Assert.Contains($"row '{row.Row}' of table {row.Table} has no number in column '{missing}' (this row's columns: {columns})", output);
        Assert.DoesNotContain($"no column '{missing}'", output);
    }
}
