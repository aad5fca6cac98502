using System.Text;
using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

public sealed class CsvTableWriterTests
{
    [Fact]
    public void Quotes_only_fields_that_need_it_as_RFC_4180_section_2_says()
    {
        // RFC 4180 section 2, rules 5-7: fields holding commas, quotes or line breaks are enclosed in
        // double quotes, and a quote inside is written twice. Missing values are empty fields.
        var path = Path.Combine(Path.GetTempPath(), "outputforge-csv-" + Guid.NewGuid().ToString("N") + ".csv");
        try
        {
            using (var csv = new CsvTableWriter(path, ["A", "B", "C", "D"]))
            {
                csv.Field("plain").Field("a, b").Field("say \"hi\"").Field((string?)null);
                csv.EndRow();
                csv.Field("two\nlines").Field(7).Field((int?)null).Field("é");
                csv.EndRow();
            }
            var expected = "A,B,C,D\nplain,\"a, b\",\"say \"\"hi\"\"\",\n\"two\nlines\",7,,é\n";
            Assert.Equal(Encoding.UTF8.GetBytes(expected), File.ReadAllBytes(path));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void A_row_with_the_wrong_number_of_fields_is_refused()
    {
        var path = Path.Combine(Path.GetTempPath(), "outputforge-csv-" + Guid.NewGuid().ToString("N") + ".csv");
        try
        {
            using var csv = new CsvTableWriter(path, ["A", "B"]);
            csv.Field("only one");
            Assert.Throws<InvalidOperationException>(csv.EndRow);
        }
        finally
        {
            File.Delete(path);
        }
    }
}
