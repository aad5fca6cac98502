namespace OutputForge.Stats.Tests;

public class LikelihoodRatioChiSquareTestTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.ChiSquare("likelihood_ratio").Select(row => new object[]
    {
        row.GetProperty("table").GetRawText(), row.GetProperty("statistic").GetDouble(), row.GetProperty("p").GetDouble(), row.GetProperty("df").GetInt32(),
    });

    /// <summary>
    /// scipy 1.10.1 chi2_contingency(correction = False, lambda_ = "log-likelihood"), values in
    /// Oracles/chi_square_oracles.json (one table has empty cells, which contribute 0).
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesScipy(string tableJson, double statistic, double p, int df)
    {
        var table = ReferenceOracles.Table(System.Text.Json.JsonDocument.Parse(tableJson).RootElement);
        var result = LikelihoodRatioChiSquareTest.Compute(table);
        Assert.Equal("Likelihood-ratio chi-square test", result.Method);
        Assert.Equal(statistic, result.Statistic!.Value, statistic * 1e-11);
        Assert.Equal(p, result.PValue, p * 1e-9);
        Assert.Equal(df, result.DegreesOfFreedom);
    }

    [Fact]
    public void ZeroColumnIsDroppedAndReported()
    {
        var result = LikelihoodRatioChiSquareTest.Compute(new[,] { { 10, 0, 20 }, { 20, 0, 15 } });
        Assert.Equal(1, result.DegreesOfFreedom);
        Assert.Contains(result.Notes, note => note.Contains("Column 2"));
    }
}
