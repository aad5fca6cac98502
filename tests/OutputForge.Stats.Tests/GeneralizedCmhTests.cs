using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Generalized CMH statistics against the R package vcdExtra 0.8.2 (CMHtest) and base R 4.2.2
/// mantelhaen.test (general association), values in Oracles/generalized_cmh_oracles.json from
/// Oracles/generate_generalized_cmh_oracles.R. "job_satisfaction" is Agresti (2002) Table 7.8 from
/// R's mantelhaen.test documentation, whose general association statistic is printed there as
/// M^2 = 10.2, df = 9, p = 0.3345.
/// </summary>
public class GeneralizedCmhTests
{
    private const string OracleFile = "generalized_cmh_oracles.json";

    private static JsonElement Oracle => GeneralizedCmhOracle.Sets(OracleFile);

    public static IEnumerable<object[]> Sets() => GeneralizedCmhOracle.SetNames(OracleFile);

    [Theory]
    [MemberData(nameof(Sets))]
    public void MatchesVcdExtraAndBaseR(string set)
    {
        var row = Oracle.GetProperty(set);
        var strata = row.GetProperty("strata").EnumerateArray().Select(ReferenceOracles.Table).ToList();
        var rowScores = row.GetProperty("row_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var columnScores = row.GetProperty("column_scores").EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var result = GeneralizedCochranMantelHaenszel.Compute(strata, rowScores, columnScores);
        GeneralizedCmhOracle.Check(row.GetProperty("cor"), result.NonzeroCorrelation);
        GeneralizedCmhOracle.Check(row.GetProperty("rmeans"), result.RowMeanScores);
        GeneralizedCmhOracle.Check(row.GetProperty("general"), result.GeneralAssociation);
        Assert.Equal(row.GetProperty("base_general").GetProperty("statistic").GetDouble(), result.GeneralAssociation.Statistic!.Value, 1e-9);
    }

    [Fact]
    public void JobSatisfactionGeneralAssociationIsThePrintedOne()
    {
        var strata = Oracle.GetProperty("job_satisfaction").GetProperty("strata").EnumerateArray().Select(ReferenceOracles.Table).ToList();
        var general = GeneralizedCochranMantelHaenszel.Compute(strata).GeneralAssociation;
        Assert.Equal(10.2, general.Statistic!.Value, 0.05);
        Assert.Equal(9, general.DegreesOfFreedom);
        Assert.Equal(0.3345, general.PValue, 0.00005);
    }

    /// <summary>
    /// For 2 x 2 x K tables the general association statistic is the (uncorrected) CMH statistic
    /// (Landis, Heyman and Koch 1978), here compared with this library's 2 x 2 x K test on the rabbits data.
    /// </summary>
    [Fact]
    public void TwoByTwoStrataReduceToTheClassicalTest()
    {
        var strata = ReferenceOracles.Strata("rabbits");
        var tables = strata.Select(s => new[,] { { s.Events1, s.Total1 - s.Events1 }, { s.Events2, s.Total2 - s.Events2 } }).ToList();
        var general = GeneralizedCochranMantelHaenszel.Compute(tables);
        double classical = CochranMantelHaenszelTest.Compute(strata).Statistic!.Value;
        Assert.Equal(classical, general.GeneralAssociation.Statistic!.Value, 1e-10);
        Assert.Equal(classical, general.NonzeroCorrelation.Statistic!.Value, 1e-10);
        Assert.Equal(classical, general.RowMeanScores.Statistic!.Value, 1e-10);
    }

    [Fact]
    public void EmptyColumnInEveryStratumReducesTheDegreesOfFreedomWithANote()
    {
        var strata = new List<int[,]> { new[,] { { 5, 0, 6 }, { 8, 0, 2 } }, new[,] { { 3, 0, 10 }, { 9, 0, 1 } }, new int[2, 3] };
        var result = GeneralizedCochranMantelHaenszel.Compute(strata);
        Assert.Equal(1, result.GeneralAssociation.DegreesOfFreedom);
        Assert.NotEmpty(result.GeneralAssociation.Notes);
        // The third stratum (index 2) has no subjects: skipped, and said so by each statistic.
        StratumRemark[] skipped = [new(2, StratumRemarkReason.NoSubjects)];
        Assert.Equal(skipped, result.GeneralAssociation.StratumRemarks);
        Assert.Equal(skipped, result.RowMeanScores.StratumRemarks);
        Assert.Equal(skipped, result.NonzeroCorrelation.StratumRemarks);
    }

    [Fact]
    public void MismatchedStrataThrow()
        => Assert.Throws<ArgumentException>(() => GeneralizedCochranMantelHaenszel.Compute(new List<int[,]> { new int[2, 3], new int[3, 3] }));
}
