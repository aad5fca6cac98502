namespace OutputForge.Stats.Tests;

/// <summary>
/// Difference intervals against statsmodels 0.13.5 confint_proportions_2indep (methods wald,
/// agresti-caffo and newcomb; values in Oracles/proportion_table_oracles.json). statsmodels leaves
/// Agresti-Caffo limits outside [-1, 1] untruncated, so its values are truncated before comparing.
/// Its "score" method is deliberately not used as an oracle: in this version it does not reproduce
/// the Miettinen-Nurminen interval as published.
/// </summary>
public class ProportionDifferenceLibraryTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.Section("difference_confint").Select(row => new object[]
    {
        row.GetProperty("method").GetString()!, row.GetProperty("events1").GetInt32(), row.GetProperty("n1").GetInt32(),
        row.GetProperty("events2").GetInt32(), row.GetProperty("n2").GetInt32(),
        row.GetProperty("lower").GetDouble(), row.GetProperty("upper").GetDouble(),
    });

    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesStatsmodels(string method, int x1, int n1, int x2, int n2, double lower, double upper)
    {
        var result = ProportionDifferenceInterval.Compute(x1, n1, x2, n2, Enum.Parse<DifferenceCiMethod>(method));
        Assert.Equal(Math.Clamp(lower, -1, 1), result.Lower, 1e-9);
        Assert.Equal(Math.Clamp(upper, -1, 1), result.Upper, 1e-9);
    }
}
