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
    private static readonly Lazy<JsonElement> Oracle = new(() => JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "generalized_cmh_ridit_oracles.json"))).RootElement.GetProperty("sets"));

    public static IEnumerable<object[]> Sets() => Oracle.Value.EnumerateObject().Select(p => new object[] { p.Name });

    [Theory]
    [MemberData(nameof(Sets))]
    public void ScoresAndStatisticsMatchVcdExtraMidranks(string set)
    {
        var row = Oracle.Value.GetProperty(set);
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
        Check(row.GetProperty("cor"), result.NonzeroCorrelation);
        Check(row.GetProperty("rmeans"), result.RowMeanScores);
        Check(row.GetProperty("general"), result.GeneralAssociation);
    }

    /// <summary>By hand: column totals 2, 0, 3 of 5 give midranks 1.5, 2.5, 4 over N + 1 = 6.</summary>
    [Fact]
    public void An_empty_column_takes_the_boundary_between_its_neighbours()
    {
        var scores = ModifiedRiditScores.Of(new[,] { { 1, 0, 2 }, { 1, 0, 1 } });
        Assert.Equal([1.5 / 6, 2.5 / 6, 4.0 / 6], scores.ToArray());
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
