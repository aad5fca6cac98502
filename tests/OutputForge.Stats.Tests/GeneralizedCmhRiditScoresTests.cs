using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Generalized CMH statistics with modified ridit column scores computed within each stratum, against
/// the R package vcdExtra 0.8.2 (R 4.2.2) CMHtest with cscores = "midrank" on 12 generated I x J x K
/// tables: the scores of each stratum and the three overall statistics, values in
/// Oracles/generalized_cmh_ridit_oracles.json from Oracles/generate_generalized_cmh_ridit_oracles.R.
/// </summary>
public class GeneralizedCmhRiditScoresTests
{
    private const string OracleFile = "generalized_cmh_ridit_oracles.json";

    private static JsonElement Oracle => GeneralizedCmhOracle.Sets(OracleFile);

    public static IEnumerable<object[]> Sets() => GeneralizedCmhOracle.SetNames(OracleFile);

    [Theory]
    [MemberData(nameof(Sets))]
    public void ScoresAndStatisticsMatchVcdExtraMidranks(string set)
    {
        var row = Oracle.GetProperty(set);
        var strata = row.GetProperty("strata").EnumerateArray().Select(ReferenceOracles.Table).ToList();
        var expectedScores = row.GetProperty("column_scores").EnumerateArray().Select(s => s.EnumerateArray().Select(v => v.GetDouble()).ToArray()).ToList();
        for (var k = 0; k < strata.Count; k++)
        {
            var scores = ModifiedRiditScores.Of(strata[k]);
            Assert.Equal(expectedScores[k].Length, scores.Count);
            for (var j = 0; j < scores.Count; j++)
            {
                Assert.Equal(expectedScores[k][j], scores[j], 1e-15);
            }
        }
        var result = GeneralizedCochranMantelHaenszel.Compute(strata, null, ModifiedRiditScores.Of);
        GeneralizedCmhOracle.Check(row.GetProperty("cor"), result.NonzeroCorrelation);
        GeneralizedCmhOracle.Check(row.GetProperty("rmeans"), result.RowMeanScores);
        GeneralizedCmhOracle.Check(row.GetProperty("general"), result.GeneralAssociation);
    }

    /// <summary>By hand: column totals 2, 0, 3 of 5 give midranks 1.5, 2.5, 4 over N + 1 = 6.</summary>
    [Fact]
    public void An_empty_column_takes_the_boundary_between_its_neighbours()
    {
        var scores = ModifiedRiditScores.Of(new[,] { { 1, 0, 2 }, { 1, 0, 1 } });
        Assert.Equal([1.5 / 6, 2.5 / 6, 4.0 / 6], scores.ToArray());
    }
}
