using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Expressions;

/// <summary>
/// A condition comparing a variable with an ISO date: a date column compares by day; a text column of ISO 8601 dates,
/// partial dates and date-times compares as text (chronological in that form); a value in any other form (01MAR2025)
/// would compare wrongly and silently move its subject in or out of a population, so it is refused with its file, line,
/// variable, value and the expected form.
/// </summary>
public sealed class DateComparisonTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private Dataset Read(string content) => CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", content));

    [Fact]
    public void A_date_not_in_iso_form_is_refused_with_its_place_in_the_data()
    {
        var data = Read("USUBJID,TRTSDT\nS1,2025-01-10\nS2,01MAR2025\nS3,2025-04-01\n");
        Assert.Equal(VariableKind.Text, data.Get("TRTSDT").Kind);
        var error = Assert.Throws<ConditionSyntaxException>(() => Condition.Compile("TRTSDT >= '2025-01-01'", data));
        Assert.Contains("TRTSDT is compared with the date '2025-01-01', but '01MAR2025' on line 3 of adsl.csv is not an ISO 8601 date (expected YYYY-MM-DD", error.Message);
    }

    [Theory]
    [InlineData("TRTSDT = '2025-03-01'")]
    [InlineData("TRTSDT in ('2025-03-01', '2025-04-01')")]
    [InlineData("TRTSDT < '2026-01-01'")]
    public void Every_comparison_with_a_date_refuses_it(string condition)
    {
        var data = Read("USUBJID,TRTSDT\nS1,2025-01-10\nS2,03/01/2025\n");
        Assert.Throws<ConditionSyntaxException>(() => Condition.Compile(condition, data));
    }

    [Fact]
    public void A_text_column_of_iso_dates_and_date_times_compares_as_text()
    {
        var data = Read("USUBJID,AESTDTC\nS1,2025-01-10\nS2,2025-03\nS3,2025-04-01T10:30\nS4,\n");
        var condition = Condition.Compile("AESTDTC >= '2025-02-01'", data);
        Assert.Equal([false, true, true, false], Enumerable.Range(0, 4).Select(condition.Matches));
    }

    [Fact]
    public void A_date_column_compares_by_day()
    {
        var data = Read("USUBJID,TRTSDT\nS1,2025-01-10\nS2,2025-03-01\n");
        Assert.Equal(VariableKind.Date, data.Get("TRTSDT").Kind);
        var condition = Condition.Compile("TRTSDT > '2025-02-28'", data);
        Assert.Equal([false, true], Enumerable.Range(0, 2).Select(condition.Matches));
    }

    [Fact]
    public void A_numeric_column_cannot_be_compared_with_a_date()
    {
        var data = Read("USUBJID,AGE\nS1,40\n");
        var error = Assert.Throws<ConditionSyntaxException>(() => Condition.Compile("AGE = '2025-01-01'", data));
        Assert.Contains("AGE holds numbers, not dates", error.Message);
    }

    [Fact]
    public void Plain_text_compared_with_a_date_names_a_value()
    {
        var data = Read("USUBJID,SEX\nS1,F\n");
        var error = Assert.Throws<ConditionSyntaxException>(() => Condition.Compile("SEX < '2025-01-01'", data));
        Assert.Contains("'F' on line 2 of adsl.csv is not an ISO 8601 date", error.Message);
    }
}
