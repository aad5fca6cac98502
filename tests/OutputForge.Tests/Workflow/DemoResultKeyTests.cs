using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using OutputForge.Results;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// Every key of the demo package follows the one documented scheme (docs/results.md, "Keys"), names one number, and
/// is what the documentation quotes (in backticks and in its QC file examples); a QC file written from the keys alone needs no CSV quoting and matches throughout.
/// </summary>
public sealed partial class DemoResultKeyTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    private sealed record Record(string Table, string Row, string Column, string Statistic, JsonElement Value, string RowLabel);

    private List<Record> Records()
    {
        using var json = JsonDocument.Parse(File.ReadAllBytes(Path.Combine(demo.Before, "results.json")));
        return json.RootElement.GetProperty("records").EnumerateArray()
            .Select(r => new Record(r.GetProperty("table").GetString()!, r.GetProperty("row").GetString()!, r.GetProperty("column").GetString()!,
                r.GetProperty("statistic").GetString()!, r.GetProperty("value").Clone(), r.GetProperty("rowLabel").GetString()!))
            .ToList();
    }

    /// <summary>The pattern as docs/results.md writes it, W expanded: the documentation and the code state one pattern.</summary>
    private static Regex DocumentedPattern()
    {
        var line = File.ReadAllLines(Path.Combine(RepositoryRoot.Path, "docs", "results.md")).Single(l => l.StartsWith("^W", StringComparison.Ordinal));
        var parts = line.Split("where W =", StringSplitOptions.TrimEntries);
        return new Regex(parts[0].Replace("W", parts[1], StringComparison.Ordinal), RegexOptions.CultureInvariant);
    }

    [Fact]
    public void The_documented_pattern_is_the_one_the_code_checks()
    {
        Assert.Equal(DocumentedPattern().ToString(), ResultKey.KeyPattern().ToString());
    }

    [Fact]
    public void Every_row_and_column_key_of_the_18_demo_tables_follows_the_documented_pattern()
    {
        var records = Records();
        var pattern = DocumentedPattern();
        Assert.Equal(18, records.Select(r => r.Table).Distinct().Count());
        var keys = records.SelectMany(r => new[] { r.Row, r.Column }).Distinct(StringComparer.Ordinal).ToList();
        Assert.All(keys, k => Assert.Matches(pattern, k));
        Assert.All(keys, k => Assert.True(ResultKey.IsKey(k), k));
        Assert.All(records.Select(r => r.Statistic).Distinct(), s => Assert.Contains(s, StatisticNames.All));
        Assert.All(keys, k => Assert.DoesNotMatch(@"[,""\s]", k));
    }

    [Fact]
    public void Every_number_of_a_demo_table_has_its_own_key_and_every_row_key_one_row()
    {
        foreach (var table in Records().GroupBy(r => r.Table))
        {
            var addresses = table.Select(r => (r.Row, r.Column, r.Statistic)).ToList();
            Assert.Equal(addresses.Count, addresses.Distinct().Count());
            // The header row's label is each column's "(N=xx)"; every other row has one label.
            Assert.All(table.Where(r => r.Row != ResultKey.Header).GroupBy(r => r.Row), row => Assert.Single(row.Select(r => r.RowLabel).Distinct()));
        }
    }

    [Fact]
    public void A_qc_file_written_from_the_keys_needs_no_quoting_and_matches_every_number()
    {
        var records = Records().Where(r => r.Value.ValueKind == JsonValueKind.Number).ToList();
        var lines = records.Select(r => string.Join(',', r.Table, r.Row, r.Column, r.Statistic,
            r.Value.GetDouble().ToString("R", CultureInfo.InvariantCulture))).ToList();
        Assert.DoesNotContain(lines, l => l.Contains('"', StringComparison.Ordinal) || l.Split(',').Length != 5);
        var qc = demo.Write("qc-every-key.csv", "table,row,column,statistic,value\n" + string.Join("\n", lines) + "\n");

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc, "--tolerance", "0"]);

        Assert.True(code == 0, output + error);
        Assert.StartsWith($"matched {records.Count}, mismatched 0,", output);
    }

    [Theory]
    [InlineData("docs/qc-workflow.md")]
    [InlineData("README.md")]
    public void The_QC_examples_of_the_documentation_match_the_demo_package(string document)
    {
        var text = File.ReadAllText(Path.Combine(RepositoryRoot.Path, document));
        var block = CsvBlocks().Matches(text).Select(m => m.Groups[1].Value).Single(b => b.StartsWith("table,row,column,statistic,value", StringComparison.Ordinal));
        var qc = demo.Write($"qc-doc-{Path.GetFileNameWithoutExtension(document)}.csv", block);

        var (code, output, error) = WorkflowDemoFixture.Run(["compare", "--production", demo.Before, "--qc", qc]);

        Assert.True(code == 0, output + error);
        Assert.StartsWith($"matched {block.Trim().Split('\n').Length - 1}, mismatched 0,", output);
    }

    /// <summary>Keys the documents quote on purpose that the demo does not have: the clash example and the earlier scheme's.</summary>
    private static readonly HashSet<string> NotDemoKeys = ["a-b", "week-4-category-1"];

    [Theory]
    [InlineData("docs/qc-workflow.md", "### The QC file", "### Matching rules")]
    [InlineData("README.md", "QC workflow details", "The run log")]
    public void Every_key_the_QC_sections_of_the_documentation_quote_is_a_key_of_the_demo_package(string document, string from, string to)
    {
        var demoKeys = Records().SelectMany(r => new[] { r.Row, r.Column }).ToHashSet(StringComparer.Ordinal);
        var text = File.ReadAllText(Path.Combine(RepositoryRoot.Path, document));
        var start = text.IndexOf(from, StringComparison.Ordinal);
        var section = text[start..text.IndexOf(to, start, StringComparison.Ordinal)];
        var inCsv = CsvBlocks().Matches(section).SelectMany(m => m.Groups[1].Value.Split('\n').Skip(1))
            .Select(l => l.Split(','))
            .Where(f => f.Length == 5)
            .SelectMany(f => new[] { f[1], f[2] });
        var quoted = Quoted().Matches(section)
            .Select(m => m.Groups[1].Value)
            .Concat(inCsv)
            .Where(q => ResultKey.IsKey(q) && (q.Contains('/', StringComparison.Ordinal) || q.Contains('-', StringComparison.Ordinal)))
            .Distinct()
            .ToList();

        Assert.NotEmpty(quoted);
        Assert.All(quoted.Where(q => !NotDemoKeys.Contains(q)), q => Assert.True(demoKeys.Contains(q), $"{document} quotes '{q}', which no demo table has"));
    }

    [GeneratedRegex(@"```csv\n(.*?)```", RegexOptions.Singleline)]
    private static partial Regex CsvBlocks();

    [GeneratedRegex(@"`([^`\s]+)`")]
    private static partial Regex Quoted();
}
