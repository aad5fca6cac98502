using System.Globalization;
using System.Text;
using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Demo;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// A large Dataset-JSON file's rows read in parts on several cores give exactly what reading it front to back gives;
/// a cut that falls on "],[" inside a text value is found out and the file read front to back. The parts are made
/// small here (a few kilobytes) so that small files are cut many times.
/// </summary>
public sealed class DatasetJsonRowPartsTests
{
    private static readonly DateTime Created = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    private static Dataset FromParser(string path, DatasetJsonReader.Parser parser)
    {
        var (rows, columns, _) = parser.Finish();
        return new Dataset("x", path, rows, columns, new RowNumbers(rows));
    }

    [Fact]
    public void Rows_read_in_parts_equal_rows_read_front_to_back()
    {
        using var temp = new TempFolder();
        DemoStudyGenerator.WriteCsv(temp.Path, new DemoStudyOptions(150, 3));
        foreach (var name in new[] { "adeff", "adae", "adsl" })
        {
            var original = CsvDatasetReader.Read(name, temp.File(name + ".csv"));
            var path = temp.File(name + ".json");
            DatasetJsonWriter.Write(original, path, Created);
            var size = new FileInfo(path).Length;
            var parser = DatasetJsonRowParts.TryRead(path, DataReadOptions.Default, size, partBytes: 4096);
            Assert.NotNull(parser);
            var parted = FromParser(path, parser);
            var whole = DatasetJsonReader.Read(name, path);
            PilotFormatsAgreementTests.AssertSameValues(whole, parted, compareLabels: true);
            for (var c = 0; c < whole.Columns.Count; c++)
            {
                Assert.Equal(whole.Columns[c].Kind, parted.Columns[c].Kind);
            }
        }
    }

    [Fact]
    public void A_cut_inside_a_text_holding_the_row_separator_sends_the_file_to_front_to_back_reading()
    {
        using var temp = new TempFolder();
        var rows = new StringBuilder();
        for (var i = 0; i < 4000; i++)
        {
            if (i > 0) rows.Append(',');
            rows.Append(CultureInfo.InvariantCulture, $"[\"S{i}\",\"a],[\\\"b\\\",1],[c\",{i}]");
        }
        var path = temp.Write("x.json", "{\"datasetJSONVersion\":\"1.1.0\",\"records\":4000,\"columns\":[{\"name\":\"USUBJID\",\"dataType\":\"string\"},"
            + "{\"name\":\"TERM\",\"dataType\":\"string\"},{\"name\":\"N\",\"dataType\":\"integer\"}],\"rows\":[" + rows + "]}");
        var whole = DatasetJsonReader.Read("x", path);
        Assert.Equal(4000, whole.RowCount);
        Assert.Equal("a],[\"b\",1],[c", whole.Get("TERM").GetText(3999));
        Assert.Equal(3999, whole.Get("N").GetNumber(3999));
        var parser = DatasetJsonRowParts.TryRead(path, DataReadOptions.Default, new FileInfo(path).Length, partBytes: 4096);
        if (parser is not null)
        {
            // Every cut happened to land on a true row start: then the parts must agree with the whole.
            PilotFormatsAgreementTests.AssertSameValues(whole, FromParser(path, parser), compareLabels: false);
        }
    }

    [Fact]
    public void The_records_attribute_after_the_rows_is_read_and_checked()
    {
        using var temp = new TempFolder();
        var rows = string.Join(",", Enumerable.Range(0, 3000).Select(i => $"[\"S{i}\",{i}]"));
        var json = "{\"datasetJSONVersion\":\"1.1.0\",\"columns\":[{\"name\":\"USUBJID\",\"dataType\":\"string\"},{\"name\":\"N\",\"dataType\":\"integer\"}],\"rows\":["
            + rows + "],\"records\":3001}";
        var path = temp.Write("x.json", json);
        var parser = DatasetJsonRowParts.TryRead(path, DataReadOptions.Default, new FileInfo(path).Length, partBytes: 4096);
        Assert.NotNull(parser);
        var error = Assert.Throws<DataException>(() => parser.Finish());
        Assert.Contains("\"records\" gives 3,001 rows, but the file holds 3,000", error.Message);
    }
}
