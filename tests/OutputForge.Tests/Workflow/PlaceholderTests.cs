using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Workflow.Shells;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Tests.Workflow;

/// <summary>Placeholders by value format and precision (common practice for SAP mock shells), and the stand-in values behind shells.</summary>
public sealed class PlaceholderTests
{
    private static TableResult Table(double floor) =>
        new("t", ["t"], "p", [], [], [], [], [], new TableProvenance("t.json", []), 1, floor);

    [Theory]
    [InlineData(ValueFormat.Count, 0, "x")]
    [InlineData(ValueFormat.Percent, 1, "xx.x")]
    [InlineData(ValueFormat.Percent, 0, "xx")]
    [InlineData(ValueFormat.Decimal, 2, "x.xx")]
    [InlineData(ValueFormat.Decimal, 0, "x")]
    [InlineData(ValueFormat.PValue, 0, "0.xxx")]
    public void EachFormatHasAPlaceholderOfItsPrecision(ValueFormat format, int decimals, string expected)
    {
        Assert.Equal(expected, CellText.PlaceholderText(new StatisticValue("s", 1.0, format, decimals), Table(0.001)));
    }

    [Fact]
    public void PValuePlaceholdersFollowTheFloor()
    {
        Assert.Equal("0.xxxx", CellText.PlaceholderText(new StatisticValue("pValue", 0.5, ValueFormat.PValue), Table(0.0001)));
    }

    [Fact]
    public void PatternsComposeFromPlaceholders()
    {
        var interval = new ResultCell("a", "({lower}, {upper})",
            [new StatisticValue("lower", 1, ValueFormat.Decimal, 1), new StatisticValue("upper", 2, ValueFormat.Decimal, 1)]);
        var zero = new ResultCell("a", "{n} ({percent})",
            [StatisticValue.Count("n", 0), StatisticValue.Count("N", 5), new StatisticValue("percent", 0, ValueFormat.Percent, 1)]);

        Assert.Equal("(x.x, x.x)", CellText.ComposePlaceholder(interval, Table(0.001)).Text);
        Assert.Equal("x (xx.x)", CellText.ComposePlaceholder(zero, Table(0.001)).Text);
        Assert.Null(CellText.ComposePlaceholder(zero, Table(0.001)).Number);
    }

    [Theory]
    [InlineData("ITTFL = 'Y' and AGE >= 65", true)]
    [InlineData("ITTFL = 'Y' and AGE >= 65", false)]
    [InlineData("SEX in ('F') and not (RACE = 'ASIAN') and TRTSDT >= '2025-01-01'", true)]
    [InlineData("AESER != 'Y' or AESER is null", false)]
    public void WitnessValuesMakeTheConditionAsWanted(string condition, bool wanted)
    {
        var values = ConditionWitness.Find(condition, wanted, new Dictionary<string, string?>());

        Assert.NotNull(values);
        var literals = ConditionWitness.Literals(condition);
        var columns = values!.Select(v => StandInColumn.Create(v.Key, ConditionWitness.KindOf(literals[v.Key]), [v.Value])).ToList();
        var row = new OutputForge.Data.Dataset("d", "d", 1, columns, [2]);
        Assert.Equal(wanted, OutputForge.Expressions.Condition.Compile(condition, row).Matches(0));
    }

    [Fact]
    public void AConditionNoLiteralCanMeetHasNoWitness()
    {
        Assert.Null(ConditionWitness.Find("AGE > 5 and AGE < 5", true, new Dictionary<string, string?>()));
    }
}
