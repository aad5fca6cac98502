using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Generalized CMH statistics over 24 generated I x J x K tables (I 2-4, J 2-6, K 1-5, sparse strata,
/// cells empty within strata, non-integer row or column scores) against the R package vcdExtra 0.8.2
/// (CMHtest overall statistics) and base R 4.2.2 mantelhaen.test (general association), values in
/// Oracles/generalized_cmh_random_oracles.json from Oracles/generate_generalized_cmh_random_oracles.R.
/// </summary>
public class GeneralizedCmhGeneratedTablesTests
{
    private static readonly Lazy<JsonElement> Oracle = new(() => JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "generalized_cmh_random_oracles.json"))).RootElement.GetProperty("sets"));

    public static IEnumerable<object[]> Sets() => Oracle.Value.EnumerateObject().Select(p => new object[] { p.Name });

    [Fact]
    public void There_are_24_generated_sets() => Assert.Equal(24, Sets().Count());

    [Theory]
    [MemberData(nameof(Sets))]
    public void MatchesVcdExtraAndMantelhaenTest(string set)
    {
        var row = Oracle.Value.GetProperty(set);
        var strata = row.GetProperty("strata").EnumerateArray().Select(ReferenceOracles.Table).ToList();
        var rowScores = row.GetProperty("row_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var columnScores = row.GetProperty("column_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var result = GeneralizedCochranMantelHaenszel.Compute(strata, rowScores, columnScores);
        Check(row.GetProperty("cor"), result.NonzeroCorrelation);
        Check(row.GetProperty("rmeans"), result.RowMeanScores);
        Check(row.GetProperty("general"), result.GeneralAssociation);
        if (row.GetProperty("base_general").ValueKind != JsonValueKind.Null)
        {
            var statistic = row.GetProperty("base_general").GetProperty("statistic").GetDouble();
            Assert.Equal(statistic, result.GeneralAssociation.Statistic!.Value, statistic * 1e-9);
        }
    }

    private static void Check(JsonElement expected, TestResult actual)
    {
        Assert.True(actual.IsEstimable, actual.NotEstimableReason);
        var statistic = expected.GetProperty("statistic").GetDouble();
        var p = expected.GetProperty("p").GetDouble();
        Assert.Equal(expected.GetProperty("df").GetInt32(), actual.DegreesOfFreedom);
        Assert.Equal(statistic, actual.Statistic!.Value, Math.Max(statistic * 1e-9, 1e-12));
        Assert.Equal(p, actual.PValue, Math.Max(p * 1e-8, 1e-14));
    }
}
