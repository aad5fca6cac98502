namespace OutputForge.Tests.Workflow;

/// <summary>
/// A QC file's row or column written as a key the table does not have (a mistyped key, or a key of the earlier scheme) is
/// an input error at its line naming the nearest key, never matched loosely (docs/qc-workflow.md, "The QC file").
/// </summary>
public sealed class QcKeyErrorTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    [Theory]
    [InlineData("14.1.3", "SEX/F", "sex/f")]
    [InlineData("14.1.3", "AGE/mean (sd)", "age/mean-sd")]
    [InlineData("14.1.3", "\"AGE/q1, q3\"", "age/q1-q3")]
    [InlineData("14.1.3", "ETHNIC/(missing)", "ethnic/missing")]
    [InlineData("14.1.3", "AGEGR1/>=65", "agegr1/ge-65")]
    [InlineData("14.1.2", "DCSREAS/LOST TO FOLLOW-UP", "dcsreas/lost-to-follow-up")]
    [InlineData("14.3.1.1", "soc:Gastrointestinal disorders/pt:Nausea", "soc-gastrointestinal-disorders/pt-nausea")]
    [InlineData("14.3.1.2", "any/severity:SEVERE", "any/severity-severe")]
    [InlineData("14.2.4.1", "week-4-category-1", "week-4/category-1")]
    [InlineData("14.2.2.1", "week-12-lsdiff-ci", "week-12/lsdiff-ci")]
    [InlineData("14.2.5.1", "sex-f", "sex/f")]
    [InlineData("14.2.5.1", "agegr1-interaction", "agegr1/interaction")]
    [InlineData("14.2.1.1", "responder", "responders")]
    [InlineData("14.2.1.1", "RESPONDERS", "responders")]
    public void A_row_written_as_a_key_the_table_lacks_is_one_line_naming_the_file_line_and_nearest_key(string table, string row, string nearest)
    {
        var qc = demo.Write($"qc-key-{Guid.NewGuid():N}.csv",
            $"table,row,column,statistic,value\n14.2.1.1,responders,placebo,n,37\n{table},{row},placebo,n,1\n");

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.Equal(2, code);
        Assert.Equal(string.Empty, output);
        var line = Assert.Single(error.TrimEnd().Split('\n'));
        Assert.Contains($"{Path.GetFileName(qc)} line 3: row '{row.Trim('"')}' is not a row key of table {table}; the nearest key is '{nearest}'", line);
        Assert.False(File.Exists(Path.ChangeExtension(qc, ".compare.xlsx")));
    }

    [Fact]
    public void A_column_written_as_a_key_the_table_lacks_is_an_error_too()
    {
        var qc = demo.Write("qc-column-key.csv", "table,row,column,statistic,value\n14.2.1.1,responders,qf-217-10,n,37\n");

        var (code, _, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.Equal(2, code);
        Assert.Contains("qc-column-key.csv line 2: column 'qf-217-10' is not a column key of table 14.2.1.1; the nearest key is 'qf-217-10-mg'", error);
    }

    [Fact]
    public void Labels_are_still_matched_and_keys_are_matched_exactly()
    {
        var qc = demo.Write("qc-labels.csv",
            "table,row,column,statistic,value\n14.1.3,Female,Placebo,n,89\n14.1.3,sex/f,placebo,n,89\n");

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.True(code == 0, output + error);
        Assert.StartsWith("matched 2, mismatched 0,", output);
    }

    [Fact]
    public void Results_of_the_earlier_key_scheme_are_refused_by_compare_and_changes()
    {
        var results = File.ReadAllText(Path.Combine(demo.Before, "results.json"));
        Assert.Contains("\"keyScheme\": 2,", results);
        var earlier = demo.Write("earlier-scheme/results.json", results.Replace("  \"keyScheme\": 2,\n", string.Empty, StringComparison.Ordinal));
        var qc = demo.Write("qc-earlier.csv", "table,row,column,statistic,value\n14.2.1.1,responders,placebo,n,37\n");

        var (code, _, error) = WorkflowDemoFixture.Run(["compare", "--production", Path.GetDirectoryName(earlier)!, "--qc", qc]);
        Assert.Equal(2, code);
        Assert.Contains("results.json: written with result key scheme 1, this version reads scheme 2", error);

        (code, _, error) = WorkflowDemoFixture.Run(["changes", "--before", Path.GetDirectoryName(earlier)!, "--after", demo.Before,
            "--report", demo.File("earlier-changes.xlsx")]);
        Assert.Equal(2, code);
        Assert.Contains("written with result key scheme 1", error);
    }

    [Fact]
    public void A_run_of_some_tables_does_not_add_to_results_of_the_earlier_key_scheme()
    {
        var output = Path.Combine(demo.Root, "earlier-partial");
        Directory.CreateDirectory(output);
        foreach (var file in Directory.GetFiles(demo.Before))
        {
            File.Copy(file, Path.Combine(output, Path.GetFileName(file)));
        }
        var results = Path.Combine(output, "results.json");
        File.WriteAllText(results, File.ReadAllText(results).Replace("  \"keyScheme\": 2,\n", string.Empty, StringComparison.Ordinal));
        var before = File.ReadAllBytes(results);

        var (code, _, error) = WorkflowDemoFixture.Run(["run", "--spec", Path.Combine(demo.Root, "specs", "demo"), "--data", demo.Data,
            "--out", output, "--tables", "14.1.1", "--format", "txt"]);

        Assert.NotEqual(0, code);
        Assert.Contains("the existing results use another result key scheme than this version's (2); run every table (leave out --tables)", error);
        Assert.Equal(before, File.ReadAllBytes(results));
    }
}
