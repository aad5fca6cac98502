using System.Globalization;
using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Demographics;

/// <summary>
/// The demo package's demographics table 14.1.3 in Excel and the populations table 14.1.1 in Word,
/// against values recomputed here from adsl.csv with the test's own CSV reader.
/// </summary>
public sealed class DemoDemographicsTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private static readonly string[] Arms = ["Placebo", "QF-217 10 mg", "QF-217 30 mg"];

    [Fact]
    public void Word_shows_the_recomputed_age_mean_and_sex_counts()
    {
        Assert.True(demo.ExitCode == 0, demo.Log);
        var itt = SimpleCsv.Read(demo.Data("adsl.csv")).Where(r => r["ITTFL"] == "Y").ToList();
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.1.3.docx"));
        var age = rows.FindIndex(r => r[0] == "Age (years)");
        var mean = rows.Skip(age).First(r => r[0] == "Mean (SD)");
        foreach (var (arm, i) in Arms.Select((a, i) => (a, i)))
        {
            var ages = itt.Where(r => r["TRT01P"] == arm).Select(r => decimal.Parse(r["AGE"], CultureInfo.InvariantCulture)).ToList();
            var average = decimal.Round(ages.Sum() / ages.Count, 1, MidpointRounding.AwayFromZero);
            Assert.StartsWith(average.ToString("0.0", CultureInfo.InvariantCulture) + " (", mean[i + 1]);
        }
        var female = rows.Skip(rows.FindIndex(r => r[0] == "Sex, n (%)")).First(r => r[0] == "Female");
        foreach (var (arm, i) in Arms.Select((a, i) => (a, i)))
        {
            var inArm = itt.Where(r => r["TRT01P"] == arm).ToList();
            var count = inArm.Count(r => r["SEX"] == "F");
            var percent = decimal.Round(100m * count / inArm.Count, 1, MidpointRounding.AwayFromZero);
            Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"{count} ({percent:0.0})"), female[i + 1]);
        }
    }

    [Fact]
    public void Word_shows_the_recomputed_population_counts()
    {
        var randomized = SimpleCsv.Read(demo.Data("adsl.csv")).Where(r => r["RANDFL"] == "Y").ToList();
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.1.1.docx"));
        var safety = rows.Single(r => r[0] == "Safety Population");
        var total = randomized.Count(r => r["SAFFL"] == "Y");
        var percent = decimal.Round(100m * total / randomized.Count, 1, MidpointRounding.AwayFromZero);
        Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"{total} ({percent:0.0})"), safety[4]);
    }

    [Fact]
    public void Every_new_table_is_written_in_word_and_excel()
    {
        foreach (var id in new[] { "14.1.1", "14.1.2", "14.1.3", "14.3.1.1", "14.3.1.2", "14.3.1.3", "14.3.1.4" })
        {
            Assert.True(File.Exists(demo.Output($"table-{id}.docx")), $"table-{id}.docx missing");
            Assert.True(File.Exists(demo.Output($"table-{id}.xlsx")), $"table-{id}.xlsx missing");
        }
    }
}
