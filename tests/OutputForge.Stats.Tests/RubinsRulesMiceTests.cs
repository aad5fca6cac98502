using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Rubin's rules against R mice 3.15.0 pool() (Oracles/rubin_oracles.json): the same five completed data sets
/// (Oracles/rubin_completed_data.csv, imputed and written out by Oracles/generate_rubin_oracles.R), lm(y ~ trt + x)
/// fitted here on each by our own linear model, the estimates and squared standard errors pooled by our engine with
/// the complete-data df n - 3 = 77 (Barnard and Rubin 1999), as pool() does for lm.
/// </summary>
public sealed class RubinsRulesMiceTests
{
    private const double Agreement = 1e-9;

    private static IReadOnlyList<LinearModelFit> Fits()
    {
        var rows = EfficacyOracles.ReadCsv("rubin_completed_data.csv");
        return rows.GroupBy(r => r["imputation"]).OrderBy(g => int.Parse(g.Key, System.Globalization.CultureInfo.InvariantCulture)).Select(g =>
        {
            var set = g.ToList();
            var design = LinearModelDesign.Build(set.Count,
                [new LinearModelCovariate("trt", set.Select(r => EfficacyOracles.Number(r["trt"])).ToList()),
                 new LinearModelCovariate("x", set.Select(r => EfficacyOracles.Number(r["x"])).ToList())], []);
            return LinearModel.Fit(set.Select(r => EfficacyOracles.Number(r["y"])).ToList(), design);
        }).ToList();
    }

    public static TheoryData<int> Terms() => new(0, 1, 2);

    [Theory]
    [MemberData(nameof(Terms))]
    public void Pooled_linear_model_coefficients_equal_mice_pool(int column)
    {
        var fits = Fits();
        Assert.Equal(5, fits.Count);
        var expected = MultiplicityOracles.Rubin.GetProperty("terms")[column];
        var n = MultiplicityOracles.Rubin.GetProperty("observations").GetInt32();
        var pooled = RubinsRules.Pool(fits.Select(f => f.Coefficients[column]).ToList(), fits.Select(f => f.Covariance[column, column]).ToList(),
            0.95, completeDataDegreesOfFreedom: n - 3);
        Assert.Equal(77, expected.GetProperty("dfcom").GetDouble());
        Close(expected, "estimate", pooled.Estimate);
        Close(expected, "ubar", pooled.WithinVariance);
        Close(expected, "b", pooled.BetweenVariance);
        Close(expected, "t", pooled.TotalVariance);
        Close(expected, "riv", pooled.RelativeIncreaseInVariance);
        Close(expected, "lambda", pooled.Lambda);
        Close(expected, "df", pooled.DegreesOfFreedom);
        Close(expected, "fmi", pooled.FractionMissingInformation);
        Close(expected, "std_error", pooled.StandardError);
        Close(expected, "statistic", pooled.Statistic);
        Close(expected, "p_value", pooled.PValue);
        Close(expected, "lower", pooled.Lower);
        Close(expected, "upper", pooled.Upper);
    }

    [Fact]
    public void Large_sample_pooling_equals_mice_pool_scalar_with_Rubins_df()
    {
        // mice 3.15.0 pool.scalar(q, u, n = Inf): Rubin's (1987) df (m - 1) / lambda^2; with n = 40, k = 3 Barnard-Rubin's.
        var scalar = MultiplicityOracles.Rubin.GetProperty("scalar");
        var q = MultiplicityOracles.Numbers(scalar.GetProperty("q"));
        var u = MultiplicityOracles.Numbers(scalar.GetProperty("u"));
        var pooled = RubinsRules.Pool(q, u, 0.95);
        Close(scalar, "qbar", pooled.Estimate);
        Close(scalar, "ubar", pooled.WithinVariance);
        Close(scalar, "b", pooled.BetweenVariance);
        Close(scalar, "t", pooled.TotalVariance);
        Close(scalar, "df", pooled.RubinDegreesOfFreedom);
        Close(scalar, "r", pooled.RelativeIncreaseInVariance);
        Close(scalar, "fmi", pooled.FractionMissingInformation);
        Assert.Null(pooled.BarnardRubinDegreesOfFreedom);

        var small = MultiplicityOracles.Rubin.GetProperty("scalar_small_sample");
        var pooledSmall = RubinsRules.Pool(q, u, 0.95, completeDataDegreesOfFreedom: 40 - 3);
        Close(small, "df", pooledSmall.DegreesOfFreedom);
        Close(small, "fmi", pooledSmall.FractionMissingInformation);
    }

    [Fact]
    public void Identical_analyses_give_the_complete_data_answer_and_say_so()
    {
        // No missing data: every completed data set is the data, B = 0, T = U, and Barnard-Rubin's df tends to
        // nu_obs = (nu_com + 1) / (nu_com + 3) nu_com (their eq. 3 with lambda = 0): 38/40 * 37 for nu_com = 37.
        var pooled = RubinsRules.Pool([1.5, 1.5, 1.5], [0.04, 0.04, 0.04], 0.95, completeDataDegreesOfFreedom: 37);
        Assert.Equal(1.5, pooled.Estimate, 14);
        Assert.Equal(0.04, pooled.TotalVariance, 14);
        Assert.Equal(0, pooled.FractionMissingInformation - 2 / (pooled.DegreesOfFreedom + 3), 14);
        Assert.Equal(38.0 / 40 * 37, pooled.DegreesOfFreedom, 12);
        Assert.Contains(pooled.Notes, n => n.Contains("complete-data", StringComparison.Ordinal));
        Assert.True(double.IsPositiveInfinity(RubinsRules.Pool([1.5, 1.5], [0.04, 0.04], 0.95).DegreesOfFreedom));
    }

    [Fact]
    public void Bad_input_is_refused_and_zero_variance_is_not_estimable()
    {
        Assert.StartsWith("1 completed-data analyses; Rubin's rules need at least 2",
            Assert.Throws<ArgumentException>(() => RubinsRules.Pool([1.0], [0.1], 0.95)).Message, StringComparison.Ordinal);
        Assert.StartsWith("2 estimates but 3 variances",
            Assert.Throws<ArgumentException>(() => RubinsRules.Pool([1.0, 2], [0.1, 0.1, 0.1], 0.95)).Message, StringComparison.Ordinal);
        Assert.False(RubinsRules.Pool([1.0, 1.0], [0, 0], 0.95).IsEstimable);
    }

    private static void Close(JsonElement expected, string name, double actual)
    {
        var value = expected.GetProperty(name).GetDouble();
        Assert.True(Math.Abs(value - actual) <= Agreement * Math.Max(1, Math.Abs(value)), $"{name}: mice {value:R}, ours {actual:R}");
    }
}
