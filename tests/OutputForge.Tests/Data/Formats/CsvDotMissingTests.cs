using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>A CSV field holding only "." (how transport files are often dumped to CSV) is a missing value, not text.</summary>
public sealed class CsvDotMissingTests
{
    [Fact]
    public void A_lone_dot_in_a_numeric_column_is_missing_and_the_column_stays_numeric()
    {
        using var folder = new TempFolder();
        var data = CsvDatasetReader.Read("adsl", folder.Write("adsl.csv", "USUBJID,AGE,TRTSDT\nS1,40,2026-01-10\nS2,.,.\nS3,6.5,2026-02-01\n"));
        Assert.Equal(VariableKind.Number, data.Get("AGE").Kind);
        Assert.Equal(VariableKind.Date, data.Get("TRTSDT").Kind);
        Assert.True(data.Get("AGE").IsMissing(1));
        Assert.Null(data.Get("AGE").GetText(1));
        Assert.True(double.IsNaN(data.Get("AGE").GetNumber(1)));
        Assert.True(data.Get("TRTSDT").IsMissing(1));
        Assert.Equal(6.5, data.Get("AGE").GetNumber(2));
    }

    [Fact]
    public void A_dot_inside_a_value_is_kept()
    {
        using var folder = new TempFolder();
        var data = CsvDatasetReader.Read("adsl", folder.Write("adsl.csv", "USUBJID,NOTE\nS1,..\nS2,.5\n"));
        Assert.Equal("..", data.Get("NOTE").GetText(0));
        Assert.Equal(".5", data.Get("NOTE").GetText(1));
    }
}
