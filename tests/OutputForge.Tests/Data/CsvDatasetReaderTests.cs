using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

public sealed class CsvDatasetReaderTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private Dataset Read(string content) => CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", content));

    private DataException Fails(string content) => Assert.Throws<DataException>(() => Read(content));

    [Fact]
    public void Types_columns_from_their_values()
    {
        var data = Read("USUBJID,AGE,TRTSDT,SEX,SITEID\nS1,40,2026-01-10,F,101\nS2,,2026-02-01,M,102\nS3,6.5,,F,103\n");
        Assert.Equal(3, data.RowCount);
        Assert.Equal(VariableKind.Number, data.Get("AGE").Kind);
        Assert.Equal(VariableKind.Date, data.Get("TRTSDT").Kind);
        Assert.Equal(VariableKind.Text, data.Get("SEX").Kind);
        Assert.True(data.Get("AGE").IsMissing(1));
        Assert.True(double.IsNaN(data.Get("AGE").GetNumber(1)));
        Assert.Equal(6.5, data.Get("AGE").GetNumber(2));
        Assert.Equal(new DateOnly(2026, 2, 1).DayNumber, data.Get("TRTSDT").GetNumber(1));
        Assert.Equal("101", data.Get("SITEID").GetText(0));
        Assert.Equal([2, 3, 4], data.LineOfRow);
    }

    [Fact]
    public void Reads_quoted_fields_with_commas_quotes_and_line_breaks()
    {
        var data = Read("USUBJID,TERM\nS1,\"Pain, back\"\nS2,\"said \"\"ouch\"\"\"\nS3,\"two\nlines\"\nS4,x\n");
        Assert.Equal("Pain, back", data.Get("TERM").GetText(0));
        Assert.Equal("said \"ouch\"", data.Get("TERM").GetText(1));
        Assert.Equal("two\nlines", data.Get("TERM").GetText(2));
        Assert.Equal(6, data.LineOfRow[3]);
    }

    [Fact]
    public void A_ragged_row_names_its_line()
    {
        var error = Fails("USUBJID,AGE\nS1,40\nS2\n");
        Assert.Equal(3, error.Line);
        Assert.Contains("adsl.csv line 3: the row has 1 fields but the header has 2", error.Message);
    }

    [Fact]
    public void An_unclosed_quote_is_reported()
    {
        var error = Fails("USUBJID,TERM\nS1,\"open\nS2,x\n");
        Assert.Contains("never closed", error.Message);
    }

    [Fact]
    public void A_stray_quote_is_reported_with_its_line()
    {
        var error = Fails("USUBJID,TERM\nS1,ok\nS2,a\"b\n");
        Assert.Equal(3, error.Line);
        Assert.Contains("quote", error.Message);
    }

    [Fact]
    public void Duplicate_variable_names_are_refused()
    {
        var error = Fails("USUBJID,AGE,age\nS1,1,2\n");
        Assert.Contains("appears twice", error.Message);
        Assert.Equal("age", error.Variable);
    }

    [Fact]
    public void Empty_and_non_utf8_files_are_refused()
    {
        Assert.Contains("empty", Fails("").Message);
        var latin1 = _folder.File("latin1.csv");
        File.WriteAllBytes(latin1, [.. "USUBJID,TERM\nS1,"u8.ToArray(), 0xE9, (byte)'\n']);
        var error = Assert.Throws<DataException>(() => CsvDatasetReader.Read("x", latin1));
        Assert.Contains("not valid UTF-8", error.Message);
        Assert.Equal(2, error.Line);
        var utf16 = _folder.File("utf16.csv");
        File.WriteAllBytes(utf16, [0xFF, 0xFE, (byte)'A', 0]);
        Assert.Contains("UTF-16", Assert.Throws<DataException>(() => CsvDatasetReader.Read("x", utf16)).Message);
    }

    [Fact]
    public void A_utf8_byte_order_mark_is_skipped()
    {
        var path = _folder.File("bom.csv");
        File.WriteAllBytes(path, [0xEF, 0xBB, 0xBF, .. "USUBJID,AGE\nS1,4\n"u8.ToArray()]);
        var data = CsvDatasetReader.Read("adsl", path);
        Assert.NotNull(data.Find("USUBJID"));
    }

    [Fact]
    public void Adam_conventions_are_checked()
    {
        var duplicate = Read("USUBJID,ITTFL\nS1,Y\nS1,N\n");
        var error = Assert.Throws<DataException>(() => AdamConformance.CheckSubjectLevel(duplicate));
        Assert.Contains("line 3", error.Message);
        Assert.Contains("second ADSL row (first on line 2)", error.Message);

        var badFlag = Read("USUBJID,ITTFL\nS1,Y\nS2,yes\n");
        var flag = Assert.Throws<DataException>(() => AdamConformance.CheckSubjectLevel(badFlag));
        Assert.Contains("line 3, variable ITTFL: flag value 'yes'", flag.Message);

        var adsl = Read("USUBJID,ITTFL\nS1,Y\n");
        var bds = CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv", "USUBJID,AVAL\nS1,3\nS9,4\n"));
        var orphan = Assert.Throws<DataException>(() => AdamConformance.CheckAgainstSubjectLevel(bds, adsl));
        Assert.Contains("adeff.csv line 3, variable USUBJID: subject S9 is not in ADSL", orphan.Message);
    }

    [Fact]
    public void Mixed_line_endings_are_read()
    {
        var path = _folder.File("mixed.csv");
        File.WriteAllBytes(path, "USUBJID,AGE\r\nS1,3\nS2,4\r\n"u8.ToArray());
        var data = CsvDatasetReader.Read("adsl", path);
        Assert.Equal(2, data.RowCount);
        Assert.Equal(4, data.Get("AGE").GetNumber(1));
    }

    [Fact]
    public void Control_characters_are_refused_or_replaced_with_a_warning()
    {
        var path = _folder.Write("ctl.csv", "USUBJID,TERM\nS1,a\u0007b\n");
        var refused = Assert.Throws<DataException>(() => CsvDatasetReader.Read("adae", path));
        Assert.Contains("ctl.csv line 2, variable TERM: the value holds the control character U+0007 at character 2", refused.Message);

        var warnings = new List<string>();
        var data = CsvDatasetReader.Read("adae", path, new DataReadOptions(ControlCharacterPolicy.Replace), warnings.Add);
        Assert.Equal("a\uFFFDb", data.Get("TERM").GetText(0));
        Assert.Contains("1 value held control characters, replaced by U+FFFD", Assert.Single(warnings));
    }
}
