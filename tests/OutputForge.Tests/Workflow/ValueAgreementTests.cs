using OutputForge.Workflow;
using OutputForge.Workflow.Compare;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// The matching rules of `compare` (docs/qc-workflow.md). Rounding at the displayed precision is
/// half away from zero on the decimal value, as the tables display (common practice in clinical reporting).
/// </summary>
public sealed class ValueAgreementTests
{
    private static RunRecord Production(string statistic, double? value, string formatted) =>
        new("t", "r", "c", statistic, value, formatted, "row", "column");

    [Theory]
    [InlineData(24.832214765100671, "24.8", "24.8", true)]
    [InlineData(24.832214765100671, "24.8", "24.832", true)]
    [InlineData(24.832214765100671, "24.8", "24.85", false)]
    [InlineData(24.85, "24.9", "24.85", true)]
    [InlineData(-9.75, "-9.8", "-9.75", true)]
    [InlineData(0.0004, "<0.001", "0.00049", true)]
    [InlineData(0.0004, "<0.001", "0.001", false)]
    [InlineData(0.9996, ">0.999", "0.9999", true)]
    [InlineData(0.0123, "0.012", "0.0124", true)]
    public void AgreementAtTheDisplayedPrecision(double value, string shown, string qc, bool agrees)
    {
        Assert.Equal(agrees, ValueAgreement.Disagreement(Production("percent", value, shown), qc, CompareTolerance.Displayed) is null);
    }

    [Theory]
    [InlineData("37", true)]
    [InlineData("37.0", true)]
    [InlineData("37.4", false)]
    [InlineData("38", false)]
    public void CountsMustAgreeExactly(string qc, bool agrees)
    {
        Assert.Equal(agrees, ValueAgreement.Disagreement(Production("n", 37, "37"), qc, CompareTolerance.Displayed) is null);
    }

    [Fact]
    public void NotEstimableAgreesOnlyWithNotEstimable()
    {
        Assert.Null(ValueAgreement.Disagreement(Production("lower", null, "NE"), "NE", CompareTolerance.Displayed));
        Assert.Null(ValueAgreement.Disagreement(Production("lower", null, "NE"), "", CompareTolerance.Displayed));
        Assert.NotNull(ValueAgreement.Disagreement(Production("lower", null, "NE"), "0", CompareTolerance.Displayed));
        Assert.NotNull(ValueAgreement.Disagreement(Production("lower", 1.5, "1.5"), "NE", CompareTolerance.Displayed));
        Assert.Contains("is not a number", ValueAgreement.Disagreement(Production("lower", 1.5, "1.5"), "1,5", CompareTolerance.Displayed));
    }

    [Fact]
    public void AnAbsoluteToleranceComparesFullPrecision()
    {
        var tolerance = CompareTolerance.Parse("0.01", out _)!;
        Assert.Null(ValueAgreement.Disagreement(Production("estimate", 20.456, "20.5"), "20.46", tolerance));
        Assert.NotNull(ValueAgreement.Disagreement(Production("estimate", 20.456, "20.5"), "20.47", tolerance));
        Assert.Null(ValueAgreement.Disagreement(Production("estimate", 0.1 + 0.2, "0.3"), "0.3", CompareTolerance.Parse("0", out _)!));
    }
}
