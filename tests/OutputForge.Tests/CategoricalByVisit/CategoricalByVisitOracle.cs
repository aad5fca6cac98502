using System.Text.Json;
using OutputForge.Kinds.CategoricalByVisit;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.CategoricalByVisit;

/// <summary>
/// Reference values of the categorical-by-visit kind written by Oracles/generate_categorical_by_visit_oracles.R
/// (R 4.2.2, vcdExtra 0.8.2 CMHtest overall statistics, base R mantelhaen.test for general association; the
/// versions are inside the JSON), one set per variant of the settings (imputation, strata, test, comparison).
/// A variant's table spec is built from those settings and analysed in-process on a study whose data folder
/// is the one given (the demo study's, or ../shared for the CDISC pilot, read in place).
/// </summary>
internal static class CategoricalByVisitOracle
{
    public sealed record Study(string Population, string PopulationWhere, string Dataset, string DatasetFile, string Parameter,
        IReadOnlyList<string> Visits, IReadOnlyList<string> OtherDatasets, string Control, string Order);

    public static JsonElement Read(string file) => JsonDocument.Parse(File.ReadAllText(
        Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Tests", "Oracles", file))).RootElement.Clone();

    public static IEnumerable<string> Variants(string file) => Read(file).GetProperty("variants").EnumerateObject().Select(p => p.Name).ToList();

    public static TableResult Analyze(Study study, string dataFolder, JsonElement variant)
    {
        using var folder = new TempFolder();
        var data = dataFolder.Replace('\\', '/');
        var datasets = string.Join(", ", new[] { "\"adsl\": \"adsl.csv\"", $"\"{study.Dataset}\": \"{study.DatasetFile}\"" });
        folder.Write("study.json", $$"""
            {
              "study": { "id": "ORACLE", "title": "Reference check" },
              "data": { "folder": "{{data}}", "datasets": { {{datasets}} } },
              "treatment": { "variable": "TRT01P", "order": "{{study.Order}}", "control": "{{study.Control}}" },
              "populations": { "{{study.Population}}": { "label": "Analysis Population", "where": "{{study.PopulationWhere}}" } },
              "tables": ["t.json"]
            }
            """);
        var categories = string.Join(", ", Enumerable.Range(1, 7).Select(i => $$"""{ "value": {{i}} }"""));
        var imputation = variant.GetProperty("imputation").ValueKind == JsonValueKind.Null ? "" : $"\"imputation\": \"{variant.GetProperty("imputation").GetString()}\",";
        folder.Write("t.json", $$"""
            {
              "id": "T", "title": ["Reference check"], "population": "{{study.Population}}", "kind": "categorical-by-visit",
              "endpoint": { "dataset": "{{study.Dataset}}", "parameter": "{{study.Parameter}}", "where": "ANL01FL = 'Y'" },
              "categoricalByVisit": {
                "visits": [{{string.Join(", ", study.Visits.Select(v => $"\"{v}\""))}}],
                "categories": [{{categories}}],
                {{imputation}}
                "strata": {{variant.GetProperty("strata").GetRawText()}},
                "test": "{{variant.GetProperty("test").GetString()}}",
                "comparison": "{{variant.GetProperty("comparison").GetString()}}",
                "scores": "{{variant.GetProperty("scores").GetString()}}"
              }
            }
            """);
        var package = SpecLoader.Load(folder.Path, [dataFolder]);
        var loaded = StudyData.Load(package.Study, dataFolder);
        return new CategoricalByVisitAnalysis().Analyze(package.Study, package.Tables[0], loaded);
    }

    /// <summary>
    /// Every reference record of the variant agrees with the table's values: counts exactly, percentages,
    /// statistics and p-values to <paramref name="relative"/>; "base-statistic" (mantelhaen.test) is compared
    /// with the table's statistic. Returns the number of values compared.
    /// </summary>
    public static int AssertAgrees(TableResult result, JsonElement oracle, string variant, double relative)
    {
        var actual = result.Rows.SelectMany(r => r.Cells.SelectMany(c => c.Values.Select(v => (Key: (r.Key, c.Column, v.Statistic), v.Value))))
            .ToDictionary(p => p.Key, p => p.Value);
        var compared = 0;
        foreach (var expected in oracle.GetProperty("records").EnumerateArray().Where(r => r.GetProperty("variant").GetString() == variant))
        {
            var statistic = expected.GetProperty("statistic").GetString()!;
            var key = (expected.GetProperty("row").GetString()!, expected.GetProperty("column").GetString()!, statistic == "base-statistic" ? "statistic" : statistic);
            Assert.True(actual.TryGetValue(key, out var value), $"{variant}: the table has no value {key}");
            var want = expected.GetProperty("value");
            if (want.ValueKind == JsonValueKind.Null)
            {
                Assert.True(value is null, $"{variant} {key}: R gives NA, the table gives {value}");
            }
            else
            {
                var w = want.GetDouble();
                Assert.True(value is not null, $"{variant} {key}: R gives {w}, the table gives no value");
                Assert.True(Math.Abs(w - value!.Value) <= relative * Math.Max(Math.Abs(w), 1e-6), $"{variant} {key}: R gives {w:R}, the table gives {value:R}");
            }
            compared++;
        }
        return compared;
    }
}
