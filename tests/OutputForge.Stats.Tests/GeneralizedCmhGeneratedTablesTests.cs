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
    private const string OracleFile = "generalized_cmh_random_oracles.json";

    private static JsonElement Oracle => GeneralizedCmhOracle.Sets(OracleFile);

    public static IEnumerable<object[]> Sets() => GeneralizedCmhOracle.SetNames(OracleFile);

    [Fact]
    public void There_are_24_generated_sets() => Assert.Equal(24, Sets().Count());

    [Theory]
    [MemberData(nameof(Sets))]
    public void MatchesVcdExtraAndMantelhaenTest(string set)
    {
        var row = Oracle.GetProperty(set);
        var strata = row.GetProperty("strata").EnumerateArray().Select(ReferenceOracles.Table).ToList();
        var rowScores = row.GetProperty("row_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var columnScores = row.GetProperty("column_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var result = GeneralizedCochranMantelHaenszel.Compute(strata, rowScores, columnScores);
        GeneralizedCmhOracle.Check(row.GetProperty("cor"), result.NonzeroCorrelation);
        GeneralizedCmhOracle.Check(row.GetProperty("rmeans"), result.RowMeanScores);
        GeneralizedCmhOracle.Check(row.GetProperty("general"), result.GeneralAssociation);
        if (row.GetProperty("base_general").ValueKind != JsonValueKind.Null)
        {
            var statistic = row.GetProperty("base_general").GetProperty("statistic").GetDouble();
            Assert.Equal(statistic, result.GeneralAssociation.Statistic!.Value, statistic * 1e-9);
        }
    }
}
