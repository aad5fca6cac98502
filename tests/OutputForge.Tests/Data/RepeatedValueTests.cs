using OutputForge.Data;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// Values repeating the row above (a subject's records, a parameter's rows) are taken as the same string without
/// decoding them again; what is read must be exactly what reading each value anew gives, control characters and
/// all, and the ADSL row of each record must follow its own USUBJID.
/// </summary>
public sealed class RepeatedValueTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Repeated_and_changing_values_read_as_written_and_a_type_change_after_repeats_keeps_them()
    {
        var data = CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv",
            "USUBJID,PARAM,FLAG,V\nS1,Itch,Y,1\nS1,Itch,Y,1\nS1,Pain,,1\nS2,Pain,Y,x\nS2,Pain,Y,x\nS2,Itch,Y,1\n"));
        Assert.Equal(["S1", "S1", "S1", "S2", "S2", "S2"], Enumerable.Range(0, 6).Select(data.Get("USUBJID").GetText));
        Assert.Equal(["Itch", "Itch", "Pain", "Pain", "Pain", "Itch"], Enumerable.Range(0, 6).Select(data.Get("PARAM").GetText));
        Assert.Equal(["Y", "Y", null, "Y", "Y", "Y"], Enumerable.Range(0, 6).Select(data.Get("FLAG").GetText));
        var v = data.Get("V");
        Assert.Equal(OutputForge.Expressions.VariableKind.Text, v.Kind);
        Assert.Equal(["1", "1", "1", "x", "x", "1"], Enumerable.Range(0, 6).Select(v.GetText));
        Assert.Equal("'x' on line 5", v.TextEvidence);
    }

    [Fact]
    public void A_repeated_value_with_a_control_character_is_replaced_and_counted_every_time()
    {
        var path = _folder.Write("adae.csv", "USUBJID,TERM\nS1,a\u0007b\nS1,a\u0007b\nS2,a\u0007b\nS2,ab\n");
        var warnings = new List<string>();
        var data = CsvDatasetReader.Read("adae", path, new DataReadOptions(ControlCharacterPolicy.Replace), warnings.Add);
        Assert.Equal(["a\uFFFDb", "a\uFFFDb", "a\uFFFDb", "ab"], Enumerable.Range(0, 4).Select(data.Get("TERM").GetText));
        Assert.Contains("3 values held control characters, replaced by U+FFFD", Assert.Single(warnings));
        var refused = Assert.Throws<DataException>(() => CsvDatasetReader.Read("adae", path));
        Assert.Contains("adae.csv line 2, variable TERM", refused.Message);
    }

    [Fact]
    public void Each_record_finds_the_subject_level_row_of_its_own_subject()
    {
        _folder.Write("adsl.csv", "USUBJID,AGE\nS2,30\nS1,40\nS3,50\n");
        var adsl = CsvDatasetReader.Read("adsl", Path.Combine(_folder.Path, "adsl.csv"));
        var records = CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv", "USUBJID,AVAL\nS1,1\nS1,2\nS3,3\nS2,4\nS1,5\n"));
        var data = StudyData.FromDatasets(_folder.Path, [adsl, records]);
        var rows = data.SubjectLevelRowsOf(records);
        Assert.Equal([1, 1, 2, 0, 1], new[] { "S1", "S1", "S3", "S2", "S1" }.Select((subject, row) => rows.Of(row, subject)));
    }
}
