using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// Trailing blanks are the padding of fixed-length text in SAS transport files, not part of a value (ADaM compares text
/// without them): the reader drops them, so "S-001 " is subject S-001 in every key and text comparison, and a value of
/// blanks only is missing. Leading blanks are kept (they are part of the value in transport files too).
/// </summary>
public sealed class TrailingBlankTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Values_are_read_without_trailing_blanks()
    {
        var data = CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv",
            "USUBJID,TRT01P,AGE,NOTE\nS1 ,Placebo  ,40 ,\" a b \"\nS2,\"Active \",51,   \n"));
        Assert.Equal("S1", data.Get("USUBJID").GetText(0));
        Assert.Equal("Placebo", data.Get("TRT01P").GetText(0));
        Assert.Equal("Active", data.Get("TRT01P").GetText(1));
        Assert.Equal(["Placebo", "Active"], data.Get("TRT01P").DistinctValues());
        Assert.Equal(VariableKind.Number, data.Get("AGE").Kind);
        Assert.Equal("40", data.Get("AGE").GetText(0));
        Assert.Equal(" a b", data.Get("NOTE").GetText(0));
        Assert.True(data.Get("NOTE").IsMissing(1));
    }

    [Fact]
    public void A_padded_subject_id_is_the_same_subject_not_a_second_one()
    {
        var adsl = CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", "USUBJID,ITTFL\nS1,Y\nS2,Y\nS1 ,Y\n"));
        var error = Assert.Throws<DataException>(() => AdamConformance.CheckSubjectLevel(adsl));
        Assert.Contains("line 4, variable USUBJID: subject S1 has a second ADSL row (first on line 2)", error.Message);
    }

    [Fact]
    public void A_padded_subject_id_in_a_bds_dataset_links_to_its_adsl_row()
    {
        var adsl = CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", "USUBJID,ITTFL\nS1,Y\nS2,Y\n"));
        var adeff = CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv", "USUBJID,PARAMCD,AVISIT\nS1  ,X ,Week 4 \nS2,X,Week 4\n"));
        AdamConformance.CheckAgainstSubjectLevel(adeff, adsl);
        Assert.Equal(["X"], adeff.Get("PARAMCD").DistinctValues());
        Assert.Equal(["Week 4"], adeff.Get("AVISIT").DistinctValues());
    }

    [Fact]
    public void A_condition_value_with_trailing_blanks_matches_the_value_without()
    {
        var adsl = CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", "USUBJID,TRT01P\nS1,Placebo \nS2,Active\n"));
        var condition = Condition.Compile("TRT01P = 'Placebo '", adsl);
        Assert.True(condition.Matches(0));
        Assert.False(condition.Matches(1));
        Assert.True(Condition.Compile("TRT01P = 'Placebo'", adsl).Matches(0));
    }
}
