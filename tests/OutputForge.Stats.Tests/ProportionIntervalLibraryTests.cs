namespace OutputForge.Stats.Tests;

/// <summary>
/// Single-proportion intervals against statsmodels 0.13.5 proportion_confint (values in
/// Oracles/proportion_table_oracles.json, produced by Oracles/generate_proportion_table_oracles.py): agresti_coull,
/// jeffreys, beta (Clopper-Pearson), wilson and normal (Wald), at 90%, 95% and 99%.
/// statsmodels' Jeffreys interval does not apply the boundary rule of Brown, Cai and DasGupta (2001,
/// Stat Sci 16:101-133, section 4.1.2: lower limit 0 when x = 0, upper limit 1 when x = n) that this
/// library follows, so at x = 0 and x = n only the other limit is compared with statsmodels.
/// </summary>
public class ProportionIntervalLibraryTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.Section("proportion_confint").Select(row => new object[]
    {
        row.GetProperty("method").GetString()!, row.GetProperty("events").GetInt32(), row.GetProperty("n").GetInt32(),
        row.GetProperty("level").GetDouble(), row.GetProperty("lower").GetDouble(), row.GetProperty("upper").GetDouble(),
    });

    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesStatsmodels(string method, int events, int n, double level, double lower, double upper)
    {
        var parsed = Enum.Parse<ProportionCiMethod>(method);
        var result = ProportionInterval.Compute(events, n, parsed, level);
        if (parsed == ProportionCiMethod.Jeffreys && events == 0)
        {
            Assert.Equal(0, result.Lower);
        }
        else
        {
            Assert.Equal(Math.Clamp(lower, 0, 1), result.Lower, 1e-9);
        }
        if (parsed == ProportionCiMethod.Jeffreys && events == n)
        {
            Assert.Equal(1, result.Upper);
        }
        else
        {
            Assert.Equal(Math.Clamp(upper, 0, 1), result.Upper, 1e-9);
        }
    }
}
