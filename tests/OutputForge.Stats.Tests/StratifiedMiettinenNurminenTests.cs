using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The stratified Miettinen-Nurminen interval. Sources: (1) with one stratum it must equal the
/// unstratified interval, which ProportionDifferencePublishedTests checks against Newcombe (1998) Table II
/// and Miettinen and Nurminen (1985) Example 5; here the same published rows are asserted directly;
/// (2) the project's own independent reimplementation from the paper (Python, numpy 1.24.2, scipy 1.10.1:
/// Oracles/generate_stratified_mn_oracles.py, values in Oracles/stratified_mn_oracles.json) over 310
/// tables with edge cases. That second implementation is not an external reference: no R package with
/// the stratified interval is installable here as a Debian package.
/// </summary>
public class StratifiedMiettinenNurminenTests
{
    private const double FourDecimals = 0.5e-4 + 1e-9;

    private static readonly Lazy<JsonDocument> Oracle = new(() => JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "stratified_mn_oracles.json"))));

    [Theory]
    // Newcombe (1998) Table II, method 6, rows (a)-(h), as in ProportionDifferencePublishedTests.
    [InlineData(56, 70, 48, 80, 0.0528, 0.3382)]
    [InlineData(9, 10, 3, 10, 0.1700, 0.8406)]
    [InlineData(6, 7, 2, 7, 0.0342, 0.8534)]
    [InlineData(5, 56, 0, 29, -0.0326, 0.1933)]
    [InlineData(0, 10, 0, 20, -0.1658, 0.2844)]
    [InlineData(0, 10, 0, 10, -0.2879, 0.2879)]
    [InlineData(10, 10, 0, 20, 0.7156, 1.0000)]
    [InlineData(10, 10, 0, 10, 0.6636, 1.0000)]
    public void OneStratumMatchesNewcombeTableII(int x1, int n1, int x2, int n2, double lower, double upper)
    {
        var result = StratifiedMiettinenNurminen.Compute([new StratumCounts(x1, n1, x2, n2)]);
        Assert.Equal(lower, result.Lower, FourDecimals);
        Assert.Equal(upper, result.Upper, FourDecimals);
        var unstratified = ProportionDifferenceInterval.Compute(x1, n1, x2, n2, DifferenceCiMethod.MiettinenNurminen);
        Assert.Equal(unstratified.Lower, result.Lower, 1e-12);
        Assert.Equal(unstratified.Upper, result.Upper, 1e-12);
        Assert.Equal(unstratified.Estimate, result.Estimate, 1e-15);
    }

    [Fact]
    public void OneStratumMatchesTheirExampleFive()
    {
        // Miettinen and Nurminen (1985) Example 5, 0/10 vs 0/20, eight decimals (as in ProportionDifferencePublishedTests).
        var result = StratifiedMiettinenNurminen.Compute([new StratumCounts(0, 10, 0, 20)]);
        Assert.Equal(-0.16576023, result.Lower, 0.5e-8 + 1e-10);
        Assert.Equal(0.28438134, result.Upper, 0.5e-8 + 1e-10);
    }

    [Fact]
    public void EveryGeneratedTableMatchesTheIndependentImplementation()
    {
        var mismatches = new List<string>();
        int compared = 0;
        foreach (var c in Oracle.Value.RootElement.GetProperty("cases").EnumerateArray())
        {
            var strata = c.GetProperty("strata").EnumerateArray()
                .Select(s => new StratumCounts(s[0].GetInt32(), s[1].GetInt32(), s[2].GetInt32(), s[3].GetInt32())).ToList();
            var result = StratifiedMiettinenNurminen.Compute(strata);
            var text = string.Join(" ", strata.Select(s => $"[{s.Events1}/{s.Total1} {s.Events2}/{s.Total2}]"));
            var skipped = c.GetProperty("skipped").EnumerateArray().Select(v => v.GetInt32()).ToList();
            var named = skipped.Count(k => result.StratumRemarks.Any(r => r.Stratum == k - 1));
            if (named != skipped.Count)
            {
                mismatches.Add($"{text}: skipped strata not all named in the notes");
            }
            if (!c.GetProperty("estimable").GetBoolean())
            {
                if (result.IsEstimable)
                {
                    mismatches.Add($"{text}: expected not estimable");
                }
                continue;
            }
            compared++;
            foreach (var (name, actual) in new[] { ("estimate", result.Estimate), ("lower", result.Lower), ("upper", result.Upper) })
            {
                var expected = c.GetProperty(name).GetDouble();
                if (Math.Abs(expected - actual) > 1e-9)
                {
                    mismatches.Add($"{text}: {name} {actual:R} vs {expected:R}");
                }
            }
        }
        Assert.True(compared >= 300, $"only {compared} estimable cases compared");
        Assert.True(mismatches.Count == 0, string.Join("\n", mismatches));
    }

    [Fact]
    public void PointEstimateIsTheMantelHaenszelRiskDifference()
    {
        // The score root equals the weighted difference with w_k = n1k n2k / N_k, the weights of the
        // Mantel-Haenszel risk difference (Greenland and Robins 1985), so the two estimates coincide.
        List<StratumCounts> strata = [new(20, 50, 10, 50), new(5, 50, 15, 50), new(12, 40, 12, 40), new(30, 60, 10, 60)];
        Assert.Equal(MantelHaenszelRiskDifference.Compute(strata).Estimate, StratifiedMiettinenNurminen.Compute(strata).Estimate, 1e-15);
        var result = StratifiedMiettinenNurminen.Compute(strata);
        Assert.Equal(0, StratifiedMiettinenNurminen.Statistic(result.Estimate, strata), 1e-12);
    }

    [Fact]
    public void EmptyGroupsAreSkippedAndNamed()
    {
        var result = StratifiedMiettinenNurminen.Compute([new(3, 5, 1, 6), new(0, 0, 2, 4), new(0, 0, 0, 0)]);
        Assert.True(result.IsEstimable);
        Assert.Equal([new StratumRemark(1, StratumRemarkReason.EmptyGroup, Group: 1), new StratumRemark(2, StratumRemarkReason.NoSubjects)], result.StratumRemarks);
        var alone = StratifiedMiettinenNurminen.Compute([new(3, 5, 1, 6)]);
        Assert.Equal(alone.Lower, result.Lower, 1e-15);
        Assert.Equal(alone.Upper, result.Upper, 1e-15);
    }

    [Fact]
    public void NoUsableStratumIsNotEstimableWithAReason()
    {
        var result = StratifiedMiettinenNurminen.Compute([new(0, 0, 1, 3), new(2, 4, 0, 0)]);
        Assert.False(result.IsEstimable);
        Assert.Equal("no stratum has subjects in both groups", result.NotEstimableReason);
        Assert.Equal([new StratumRemark(0, StratumRemarkReason.EmptyGroup, Group: 1), new StratumRemark(1, StratumRemarkReason.EmptyGroup, Group: 2)], result.StratumRemarks);
    }

    [Fact]
    public void SwappingTheGroupsMirrorsTheInterval()
    {
        List<StratumCounts> strata = [new(12, 40, 5, 38), new(20, 55, 11, 60), new(7, 25, 4, 27)];
        var forward = StratifiedMiettinenNurminen.Compute(strata);
        var backward = StratifiedMiettinenNurminen.Compute(strata.Select(s => new StratumCounts(s.Events2, s.Total2, s.Events1, s.Total1)).ToList());
        Assert.Equal(-forward.Lower, backward.Upper, 1e-12);
        Assert.Equal(-forward.Upper, backward.Lower, 1e-12);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(double.NaN)]
    public void RejectsALevelOutsideZeroToOne(double level)
        => Assert.Throws<ArgumentOutOfRangeException>(() => StratifiedMiettinenNurminen.Compute([new(1, 2, 1, 2)], level));
}
