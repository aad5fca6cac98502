using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// A value that reads as a number no statistic can use (NaN, an infinity, an overflow, a magnitude beyond 1e100, a
/// decimal comma) in a column whose other values are numbers is a data error at its own line, naming the variable and
/// the value: never a silent missing value, nor a column turned to text that a table then reads as n = 0.
/// </summary>
public sealed class UnusableNumberTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string File(string value) => _folder.Write("adeff.csv",
        "USUBJID,PARAMCD,AVAL\nS1,X,1.5\nS2,X,2\n" + $"S3,X,{value}\n" + "S4,X,4.25\nS5,X,5\n");

    [Theory]
    [InlineData("\"1,5\"", "'1,5' is not a number: write numbers with a decimal point")]
    [InlineData("\"1.000,5\"", "'1.000,5' is not a number: write numbers with a decimal point")]
    [InlineData("\"1,000.5\"", "'1,000.5' is not a number: write numbers with a decimal point")]
    [InlineData("NaN", "'NaN' is not a number (leave a missing value empty; NaN is refused)")]
    [InlineData("nan", "'nan' is not a number (leave a missing value empty; NaN is refused)")]
    [InlineData("Infinity", "'Infinity' is infinite")]
    [InlineData("-Infinity", "'-Infinity' is infinite")]
    [InlineData("1e400", "'1e400' overflows: it is beyond the double range")]
    [InlineData("-1e400", "'-1e400' overflows")]
    [InlineData("1e300", "'1e300' is beyond 1e100 in magnitude")]
    [InlineData("-2.5e101", "'-2.5e101' is beyond 1e100 in magnitude")]
    public void An_unusable_number_is_an_error_at_its_line(string value, string expected)
    {
        var error = Assert.Throws<DataException>(() => CsvDatasetReader.Read("adeff", File(value)));
        Assert.Equal(4, error.Line);
        Assert.Equal("AVAL", error.Variable);
        Assert.StartsWith($"{_folder.File("adeff.csv")} line 4, variable AVAL: {expected}", error.Message);
    }

    [Theory]
    [InlineData("1e100")]
    [InlineData("-1e100")]
    [InlineData("1e-300")]
    [InlineData("1.5E3")]
    public void Numbers_up_to_1e100_in_magnitude_are_read(string value)
    {
        var data = CsvDatasetReader.Read("adeff", File(value));
        Assert.Equal(VariableKind.Number, data.Get("AVAL").Kind);
        Assert.Equal(double.Parse(value, System.Globalization.CultureInfo.InvariantCulture), data.Get("AVAL").GetNumber(2));
    }

    [Fact]
    public void The_first_unusable_value_in_file_order_is_reported()
    {
        var path = _folder.Write("adeff.csv", "USUBJID,AVAL\nS1,1\nS2,NaN\nS3,\"2,5\"\n");
        var error = Assert.Throws<DataException>(() => CsvDatasetReader.Read("adeff", path));
        Assert.Equal(3, error.Line);
    }

    [Fact]
    public void Of_unusable_numbers_in_several_columns_the_earliest_line_is_reported()
    {
        var path = _folder.Write("adeff.csv", "USUBJID,BASE,AVAL\nS1,1,1\nS2,1,NaN\nS3,\"2,5\",2\n");
        var error = Assert.Throws<DataException>(() => CsvDatasetReader.Read("adeff", path));
        Assert.Equal(3, error.Line);
        Assert.Equal("AVAL", error.Variable);
    }

    [Fact]
    public void A_file_read_in_parts_reports_the_same_value_and_line()
    {
        var rows = string.Concat(Enumerable.Range(1, 400).Select(i => $"S{i},X,{(i == 333 ? "\"7,5\"" : i.ToString(System.Globalization.CultureInfo.InvariantCulture))}\n"));
        var path = _folder.Write("adeff.csv", "USUBJID,PARAMCD,AVAL\n" + rows);
        var file = CsvFileParts.Open("adeff", path, DataReadOptions.Default, partBytes: 500);
        Assert.True(file.Count > 2);
        Parallel.For(0, file.Count, file.Read);
        var error = Assert.Throws<DataException>(() => file.Finish(_ => { }));
        Assert.Equal(334, error.Line);
        Assert.Contains("variable AVAL: '7,5' is not a number", error.Message);
    }

    [Theory]
    [InlineData("Nan")]
    [InlineData("\"1,5\"")]
    public void A_text_column_keeps_such_values_as_text(string value)
    {
        // A column with other text ("Grade 2") is text: a value that merely looks like a broken number is a text value.
        var path = _folder.Write("adae.csv", $"USUBJID,AETOXGR\nS1,Grade 2\nS2,{value}\nS3,3\n");
        var data = CsvDatasetReader.Read("adae", path);
        Assert.Equal(VariableKind.Text, data.Get("AETOXGR").Kind);
        Assert.Equal(value.Trim('"'), data.Get("AETOXGR").GetText(1));
    }

    [Fact]
    public void A_text_column_made_so_by_a_word_names_the_first_value_that_is_no_number()
    {
        var path = _folder.Write("adsl.csv", "USUBJID,AGE\nS1,40\nS2,NaN\nS3,forty\n");
        var data = CsvDatasetReader.Read("adsl", path);
        Assert.Equal(VariableKind.Text, data.Get("AGE").Kind);
        Assert.Equal("'NaN' on line 3", data.Get("AGE").TextEvidence);
    }
}
