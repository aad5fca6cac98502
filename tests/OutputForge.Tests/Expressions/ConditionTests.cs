using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Expressions;

public sealed class ConditionTests : IDisposable
{
    private readonly TempFolder _folder = new();
    private readonly Dataset _data;

    public ConditionTests()
    {
        var path = _folder.Write("adsl.csv",
            "USUBJID,SEX,AGE,ITTFL,TRTSDT,RACE\n" +
            "S1,F,40,Y,2026-01-10,WHITE\n" +
            "S2,M,65,Y,2026-02-01,ASIAN\n" +
            "S3,F,,N,,\"BLACK OR AFRICAN AMERICAN\"\n" +
            "S4,M,80,,2026-03-15,WHITE\n");
        _data = CsvDatasetReader.Read("adsl", path);
    }

    public void Dispose() => _folder.Dispose();

    private string[] Select(string condition)
    {
        var compiled = Condition.Compile(condition, _data);
        var subjects = _data.Get("USUBJID");
        return Enumerable.Range(0, _data.RowCount).Where(compiled.Matches).Select(r => subjects.GetText(r)!).ToArray();
    }

    [Theory]
    [InlineData("ITTFL = 'Y'", "S1,S2")]
    [InlineData("ITTFL = \"Y\"", "S1,S2")]
    [InlineData("AGE >= 65", "S2,S4")]
    [InlineData("AGE < 65", "S1")]
    [InlineData("SEX = 'F' and AGE > 30", "S1")]
    [InlineData("SEX = 'F' or AGE > 70", "S1,S3,S4")]
    [InlineData("not SEX = 'F'", "S2,S4")]
    [InlineData("RACE in ('WHITE', 'ASIAN')", "S1,S2,S4")]
    [InlineData("RACE not in ('WHITE')", "S2,S3")]
    [InlineData("AGE is null", "S3")]
    [InlineData("ITTFL is not null", "S1,S2,S3")]
    [InlineData("AGE IS NULL", "S3")]
    [InlineData("ITTFL Is Not Null", "S1,S2,S3")]
    [InlineData("TRTSDT >= '2026-02-01'", "S2,S4")]
    [InlineData("(SEX = 'M' or AGE is null) and ITTFL != 'N'", "S2")]
    [InlineData("sex = 'F' AND age > 30", "S1")]
    [InlineData("AGE = 40.0", "S1")]
    public void Selects_the_expected_rows(string condition, string expected)
    {
        Assert.Equal(expected.Split(','), Select(condition));
    }

    [Fact]
    public void A_missing_value_satisfies_no_comparison()
    {
        // Documented rule: comparisons with a missing value are false, whatever the operator.
        Assert.Equal(["S1", "S2", "S4"], Select("AGE != 50"));
        Assert.Equal(["S1", "S2", "S3"], Select("ITTFL != 'X'"));
    }

    [Theory]
    [InlineData("ITTFX = 'Y'", 1, "no variable ITTFX (did you mean 'ITTFL'?)")]
    [InlineData("ITTFL = Y", 9, "put text values in quotes")]
    [InlineData("AGE > '65'", 7, "AGE is numeric")]
    [InlineData("SEX = 1", 7, "SEX holds text")]
    [InlineData("AGE >= 65 and", 14, "expected a variable name")]
    [InlineData("(AGE > 1", 9, "expected ')'")]
    [InlineData("SEX = 'F", 7, "no closing '")]
    [InlineData("SEX == 'F'", 6, "expected a quoted text or a number")]
    [InlineData("TRTSDT > '01JAN2026'", 10, "not an ISO 8601 date")]
    [InlineData("AGE is 5", 8, "expected 'null' or 'not null' after 'is'")]
    [InlineData("AGE is not 5", 12, "expected 'null' after 'is not'")]
    [InlineData("AGE = null", 7, "test for one with 'is null' or 'is not null'")]
    [InlineData("SEX in 'F'", 8, "expected '('")]
    [InlineData("", 1, "empty")]
    [InlineData("SEX = 'F' SEX = 'M'", 11, "expected 'and', 'or'")]
    [InlineData("AGE # 3", 5, "unexpected character '#'")]
    public void Errors_point_to_the_character(string condition, int position, string message)
    {
        var error = Assert.Throws<ConditionSyntaxException>(() => Condition.Compile(condition, _data));
        Assert.Equal(position, error.Position);
        Assert.Contains(message, error.Message);
    }

    [Theory]
    [InlineData("AGE is missing", 8, "the missing-value test is written 'is null', not 'is missing'")]
    [InlineData("ITTFL is not missing", 14, "the missing-value test is written 'is not null', not 'is not missing'")]
    [InlineData("SEX = 'F' and AGE IS Missing", 22, "written 'is null', not 'IS Missing'")]
    public void The_old_missing_value_test_names_the_form_to_write(string condition, int position, string message)
    {
        var error = Assert.Throws<ConditionSyntaxException>(() => Condition.Compile(condition, _data));
        Assert.Equal(position, error.Position);
        Assert.Contains(message, error.Message);
    }

    [Fact]
    public void Missing_is_no_keyword_and_can_name_a_variable()
    {
        var path = _folder.Write("m.csv", "USUBJID,MISSING\nA,Y\nB,\n");
        var data = CsvDatasetReader.Read("m", path);
        Assert.True(Condition.Compile("MISSING = 'Y'", data).Matches(0));
        Assert.True(Condition.Compile("missing is null", data).Matches(1));
        Assert.False(Condition.Compile("missing is null", data).Matches(0));
    }

    [Fact]
    public void Reports_the_variables_it_reads()
    {
        var condition = Condition.Compile("SEX = 'F' and (AGE > 3 or AGE is null)", _data);
        Assert.Equal(["AGE", "SEX"], condition.Variables);
    }

    [Fact]
    public void Doubled_quotes_stand_for_a_quote()
    {
        var path = _folder.Write("q.csv", "USUBJID,TERM\nA,\"O'Brien sign\"\nB,other\n");
        var data = CsvDatasetReader.Read("q", path);
        var condition = Condition.Compile("TERM = 'O''Brien sign'", data);
        Assert.True(condition.Matches(0));
        Assert.False(condition.Matches(1));
    }
}
