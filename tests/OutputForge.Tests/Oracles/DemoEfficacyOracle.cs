using System.Text.Json;
using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Oracles;

/// <summary>
/// Reference records for the demo efficacy tables, written by generate_demo_efficacy_oracles.R (R 4.2.2,
/// survival 3.5.3; the versions are inside the JSON) from the default demo study, whose files are pinned
/// by SHA-256 in DemoStudyFingerprintTests. Compares them with the run's results.json.
/// </summary>
internal static class DemoEfficacyOracle
{
    public static IEnumerable<JsonElement> Records(string file, string table)
    {
        using var document = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Tests", "Oracles", file)));
        return document.RootElement.GetProperty("records").EnumerateArray()
            .Where(r => r.GetProperty("table").GetString() == table).Select(r => r.Clone()).ToList();
    }

    /// <summary>Every reference value of <paramref name="table"/> agrees with the run's results.json.</summary>
    public static void AssertAgrees(DemoRunFixture demo, string table, double relative)
    {
        using var json = JsonDocument.Parse(File.ReadAllText(demo.Output("results.json")));
        var actual = json.RootElement.GetProperty("records").EnumerateArray()
            .Where(r => r.GetProperty("table").GetString() == table)
            .ToDictionary(r => (r.GetProperty("row").GetString()!, r.GetProperty("column").GetString()!, r.GetProperty("statistic").GetString()!),
                r => r.GetProperty("value").ValueKind == JsonValueKind.Null ? (double?)null : r.GetProperty("value").GetDouble());
        AssertAgrees(actual, Records("demo_efficacy_oracles.json", table), relative);
    }

    /// <summary>Every reference value agrees with the table's own values (null = not estimable on both sides).</summary>
    public static void AssertAgrees(OutputForge.Results.TableResult result, string file, string table, double relative)
    {
        var actual = result.Rows.SelectMany(r => r.Cells.SelectMany(c => c.Values.Select(v => (Key: (r.Key, c.Column, v.Statistic), v.Value))))
            .ToDictionary(p => p.Key, p => p.Value);
        AssertAgrees(actual, Records(file, table), relative);
    }

    private static void AssertAgrees(Dictionary<(string, string, string), double?> actual, IEnumerable<JsonElement> records, double relative)
    {
        var checkedCount = 0;
        foreach (var expected in records)
        {
            var key = (expected.GetProperty("row").GetString()!, expected.GetProperty("column").GetString()!, expected.GetProperty("statistic").GetString()!);
            Assert.True(actual.TryGetValue(key, out var value), $"the table has no value {key}");
            var want = expected.GetProperty("value");
            if (want.ValueKind == JsonValueKind.Null)
            {
                Assert.True(value is null, $"{key}: R gives NA, the table gives {value}");
            }
            else
            {
                Assert.True(value is not null, $"{key}: R gives {want.GetDouble()}, the table gives no value");
                var w = want.GetDouble();
                Assert.True(Math.Abs(w - value!.Value) <= relative * Math.Max(Math.Abs(w), 1e-6),
                    $"{key}: R gives {w:R}, the table gives {value:R}");
            }
            checkedCount++;
        }
        Assert.True(checkedCount > 20, $"only {checkedCount} reference values");
    }
}
