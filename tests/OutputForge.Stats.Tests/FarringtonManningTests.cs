using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The Farrington-Manning (1990, Stat Med 9:1447-1454) score test against a margin and the Miettinen-Nurminen (1985)
/// interval at the two-sided level 1 - 2 alpha, against Oracles/adjusted_logistic_oracles.json ("farringtonManning"):
/// R 4.2.2 code written in Oracles/generate_adjusted_logistic_oracles.R from the paper, with the restricted maximum
/// likelihood estimates found numerically by optimize() rather than by the closed form used here. The worked example
/// tables of the paper were not available, so the cases are invented (non-inferiority and superiority, both directions).
/// </summary>
public sealed class FarringtonManningTests
{
    private static readonly JsonElement Cases = JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "adjusted_logistic_oracles.json"))).RootElement.GetProperty("farringtonManning");

    private static void Close(double expected, double actual, double tolerance, string what) =>
        Assert.True(Math.Abs(expected - actual) <= tolerance, $"{what}: R {expected:R}, ours {actual:R}");

    [Fact]
    public void The_test_the_interval_and_the_conclusion_match_the_R_code_written_from_the_paper()
    {
        Assert.True(Cases.GetArrayLength() >= 7);
        foreach (var c in Cases.EnumerateArray())
        {
            var hypothesis = c.GetProperty("hypothesis").GetString() == "superiority" ? MarginHypothesis.Superiority : MarginHypothesis.NonInferiority;
            var direction = c.GetProperty("direction").GetString() == "higher" ? MarginDirection.HigherIsBetter : MarginDirection.LowerIsBetter;
            var result = FarringtonManningTest.Compute(c.GetProperty("events1").GetInt32(), c.GetProperty("n1").GetInt32(),
                c.GetProperty("events2").GetInt32(), c.GetProperty("n2").GetInt32(), c.GetProperty("margin").GetDouble(),
                c.GetProperty("alpha").GetDouble(), hypothesis, direction);
            var what = c.ToString();
            Close(c.GetProperty("nullDifference").GetDouble(), result.NullDifference, 1e-15, what + " null difference");
            Close(c.GetProperty("z").GetDouble(), result.Test.Statistic!.Value, 1e-7, what + " Z");
            Close(c.GetProperty("p").GetDouble(), result.Test.PValue, 1e-8, what + " p");
            Close(c.GetProperty("lower").GetDouble(), result.Interval.Lower, 1e-8, what + " lower");
            Close(c.GetProperty("upper").GetDouble(), result.Interval.Upper, 1e-8, what + " upper");
            Assert.Equal(c.GetProperty("shown").GetBoolean() ? MarginConclusion.Shown : MarginConclusion.NotShown, result.Conclusion);
        }
    }

    [Fact]
    public void At_a_zero_margin_the_statistic_is_the_pooled_score_statistic()
    {
        // Farrington and Manning (1990, section 2): with delta0 = 0 the restricted estimates are the pooled proportion and
        // Z is the usual pooled two-sample statistic, whose square is Pearson's chi-square of the 2 x 2 table.
        var result = FarringtonManningTest.Compute(80, 100, 62, 100, 0, 0.025, MarginHypothesis.Superiority);
        var pooled = 142.0 / 200;
        var expected = (0.80 - 0.62) / Math.Sqrt(pooled * (1 - pooled) * (2.0 / 100));
        Close(expected, result.Test.Statistic!.Value, 1e-12, "pooled Z");
        var chi = PearsonChiSquareTest.Compute(new[,] { { 80, 20 }, { 62, 38 } });
        Close(chi.Statistic!.Value, expected * expected, 1e-10, "Z squared against Pearson's chi-square");
    }

    [Fact]
    public void An_empty_group_is_not_estimable_and_a_bad_alpha_or_margin_is_refused()
    {
        var empty = FarringtonManningTest.Compute(0, 0, 5, 10, 0.1, 0.025);
        Assert.Equal(MarginConclusion.NotEstimable, empty.Conclusion);
        Assert.False(empty.Test.IsEstimable);
        Assert.Throws<ArgumentOutOfRangeException>(() => FarringtonManningTest.Compute(5, 10, 5, 10, 0.1, 0.6));
        Assert.Throws<ArgumentOutOfRangeException>(() => FarringtonManningTest.Compute(5, 10, 5, 10, -0.1, 0.025));
    }

    [Fact]
    public void A_continuous_difference_against_its_margin_agrees_with_its_interval()
    {
        // Student's t quantile t(0.975, 40) = 2.0210754 (R 4.2.2: qt(0.975, 40) = 2.0210753903).
        var result = ContinuousMarginComparison.Compute(-0.5, 0.6, 40, 2.0, 0.025);
        Assert.Equal(-2.0, result.NullDifference);
        Close(-0.5 - 2.0210754 * 0.6, result.Interval.Lower, 1e-6, "lower");
        Close(2.5, result.Test.Statistic!.Value, 1e-12, "T");
        Assert.True(result.IntervalExcludesNull);
        Assert.Equal(MarginConclusion.Shown, result.Conclusion);
        var lower = ContinuousMarginComparison.Compute(1.5, 0.6, 40, 2.0, 0.025, MarginHypothesis.NonInferiority, MarginDirection.LowerIsBetter);
        Assert.Equal(2.0, lower.NullDifference);
        Assert.Equal(MarginConclusion.NotShown, lower.Conclusion);
        Assert.False(lower.IntervalExcludesNull);
        Assert.Equal(MarginConclusion.NotEstimable, ContinuousMarginComparison.Compute(1, 0, 40, 2, 0.025).Conclusion);
    }
}
