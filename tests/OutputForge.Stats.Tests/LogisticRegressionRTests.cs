using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Logistic regression and its likelihood-ratio test against R 4.2.2 glm(family = binomial) and
/// anova(test = "LRT"), from Oracles/generate_logistic_oracles.R (invented data written into
/// Oracles/logistic_oracles.json with the values).
/// </summary>
public sealed class LogisticRegressionRTests
{
    private static readonly JsonElement Cases = JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "logistic_oracles.json"))).RootElement.GetProperty("cases");

    private static double[,] Matrix(JsonElement rows)
    {
        var list = rows.EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetDouble()).ToArray()).ToArray();
        var m = new double[list.Length, list[0].Length];
        for (int i = 0; i < list.Length; i++)
        {
            for (int j = 0; j < list[0].Length; j++)
            {
                m[i, j] = list[i][j];
            }
        }
        return m;
    }

    private static (LogisticRegressionFit Reduced, LogisticRegressionFit Full, JsonElement Case) FitCase(string name)
    {
        var c = Cases.GetProperty(name);
        var y = c.GetProperty("y").EnumerateArray().Select(v => v.GetInt32()).ToList();
        var reduced = LogisticRegression.Fit(y, Matrix(c.GetProperty("reduced_x")),
            c.GetProperty("reduced_columns").EnumerateArray().Select(v => v.GetString()!).ToList());
        var full = LogisticRegression.Fit(y, Matrix(c.GetProperty("full_x")),
            c.GetProperty("full_columns").EnumerateArray().Select(v => v.GetString()!).ToList());
        return (reduced, full, c);
    }

    private static void Close(double expected, double actual, double relative, string what) =>
        Assert.True(Math.Abs(expected - actual) <= relative * Math.Max(1, Math.Abs(expected)), $"{what}: R {expected:R}, ours {actual:R}");

    [Theory]
    [InlineData("two_arms_three_levels")]
    [InlineData("three_arms_two_levels")]
    [InlineData("continuous_covariate")]
    public void Converged_fits_and_the_test_match_R(string name)
    {
        var (reduced, full, c) = FitCase(name);
        var r = c.GetProperty("full");
        Assert.True(full.Converged);
        Assert.Equal(Separation.None, full.Separation);
        Assert.Equal(r.GetProperty("iterations").GetInt32(), full.Iterations);
        Assert.Equal(c.GetProperty("reduced").GetProperty("iterations").GetInt32(), reduced.Iterations);
        Close(c.GetProperty("reduced").GetProperty("deviance").GetDouble(), reduced.Deviance, 1e-10, "reduced deviance");
        Close(r.GetProperty("deviance").GetDouble(), full.Deviance, 1e-10, "full deviance");
        var coefficients = r.GetProperty("coefficients").EnumerateArray().Select(v => v.GetDouble()).ToList();
        var errors = r.GetProperty("standard_errors").EnumerateArray().Select(v => v.GetDouble()).ToList();
        for (int j = 0; j < coefficients.Count; j++)
        {
            Close(coefficients[j], full.Coefficients[j], 1e-8, $"coefficient {full.ColumnNames[j]}");
            Close(errors[j], full.StandardError(j), 1e-8, $"standard error {full.ColumnNames[j]}");
        }
        var test = LogisticLikelihoodRatioTest.Compute(reduced, full);
        var lrt = c.GetProperty("lrt");
        Assert.True(test.IsEstimable, test.NotEstimableReason);
        Close(lrt.GetProperty("statistic").GetDouble(), test.Statistic!.Value, 1e-8, "LR statistic");
        Assert.Equal(lrt.GetProperty("df").GetInt32(), (int)test.DegreesOfFreedom!.Value);
        Close(lrt.GetProperty("p").GetDouble(), test.PValue, 1e-8, "p-value");
    }

    [Theory]
    [InlineData("two_arms_three_levels")]
    [InlineData("three_arms_two_levels")]
    [InlineData("quasi_separated")]
    public void The_two_factor_design_is_R_model_matrix(string name)
    {
        var c = Cases.GetProperty(name);
        var full = Matrix(c.GetProperty("full_x"));
        var columns = c.GetProperty("full_columns").EnumerateArray().Select(v => v.GetString()!).ToList();
        // Recover each observation's levels from R's indicator columns, then rebuild the matrix.
        int aCount = columns.Count(n => n.StartsWith("arm", StringComparison.Ordinal) && !n.Contains(':')) + 1;
        int bCount = columns.Count(n => n.StartsWith("sub", StringComparison.Ordinal)) + 1;
        var a = new List<int>();
        var b = new List<int>();
        for (int r = 0; r < full.GetLength(0); r++)
        {
            a.Add(Enumerable.Range(1, aCount - 1).FirstOrDefault(i => full[r, i] == 1));
            b.Add(Enumerable.Range(1, bCount - 1).FirstOrDefault(j => full[r, aCount - 1 + j] == 1));
        }
        var (x, names) = TwoFactorDesign.Build(a, Enumerable.Range(0, aCount).Select(i => $"a{i}").ToList(),
            b, Enumerable.Range(0, bCount).Select(j => $"b{j}").ToList(), interaction: true);
        Assert.Equal(columns.Count, names.Count);
        for (int r = 0; r < full.GetLength(0); r++)
        {
            for (int j = 0; j < columns.Count; j++)
            {
                Assert.Equal(full[r, j], x[r, j]);
            }
        }
    }

    [Fact]
    public void Quasi_separation_that_R_reports_as_converged_is_flagged_and_gives_no_p_value()
    {
        var (reduced, full, c) = FitCase("quasi_separated");
        var r = c.GetProperty("full");
        // R 4.2.2 converges here without a warning (see the oracle's "warnings") and prints a p-value.
        Assert.True(r.GetProperty("converged").GetBoolean());
        Assert.Equal(0, r.GetProperty("warnings").GetArrayLength());
        Assert.Equal(r.GetProperty("iterations").GetInt32(), full.Iterations);
        Close(r.GetProperty("deviance").GetDouble(), full.Deviance, 1e-7, "full deviance");
        Close(c.GetProperty("reduced").GetProperty("deviance").GetDouble(), reduced.Deviance, 1e-10, "reduced deviance");
        Assert.Equal(Separation.QuasiComplete, full.Separation);
        Assert.Equal(Separation.None, reduced.Separation);
        var test = LogisticLikelihoodRatioTest.Compute(reduced, full);
        Assert.False(test.IsEstimable);
        Assert.Contains("quasi-complete separation", test.NotEstimableReason);
    }

    [Fact]
    public void Complete_separation_does_not_converge_as_in_R()
    {
        var (reduced, full, c) = FitCase("complete_separation");
        var r = c.GetProperty("full");
        Assert.False(r.GetProperty("converged").GetBoolean());
        Assert.Equal(r.GetProperty("iterations").GetInt32(), full.Iterations);
        Assert.False(full.Converged);
        Assert.Equal(Separation.Complete, full.Separation);
        Assert.True(full.Deviance < 1e-6, $"deviance {full.Deviance}; R {r.GetProperty("deviance").GetDouble():R}");
        var test = LogisticLikelihoodRatioTest.Compute(reduced, full);
        Assert.False(test.IsEstimable);
        Assert.Contains("did not converge", test.NotEstimableReason);
        Assert.Contains("complete separation", test.NotEstimableReason);
    }

    [Fact]
    public void An_empty_design_column_is_reported_not_fitted()
    {
        var x = new double[,] { { 1, 0 }, { 1, 0 }, { 1, 0 }, { 1, 0 } };
        var fit = LogisticRegression.Fit([0, 1, 1, 0], x, ["(Intercept)", "empty"]);
        Assert.False(fit.IsEstimable);
        Assert.Contains("empty", fit.NotEstimableReason);
    }
}
