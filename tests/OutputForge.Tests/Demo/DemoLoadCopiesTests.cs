using OutputForge.Demo;
using Xunit;

namespace OutputForge.Tests.Demo;

/// <summary>
/// The load-copies option only appends copies of each subject's ITCH records under new parameter codes;
/// the ordinary rows stay exactly as without it, and adsl.csv does not change.
/// </summary>
public sealed class DemoLoadCopiesTests
{
    [Fact]
    public void Copies_repeat_the_itch_records_under_new_codes_and_keep_the_ordinary_rows()
    {
        var plain = DemoStudyFiles.NewTempFolder();
        var loaded = DemoStudyFiles.NewTempFolder();
        try
        {
            DemoStudyGenerator.WriteCsv(plain, new DemoStudyOptions(Subjects: 30));
            DemoStudyGenerator.WriteCsv(loaded, new DemoStudyOptions(Subjects: 30, LoadCopies: 2));
            var before = CsvTable.Read(Path.Combine(plain, "adeff.csv"));
            var after = CsvTable.Read(Path.Combine(loaded, "adeff.csv"));
            var code = before.Header.ToList().IndexOf("PARAMCD");
            var itch = before.Rows.Count(r => r[code] == "ITCH");

            Assert.Equal(before.Rows.Count + 2 * itch, after.Rows.Count);
            Assert.Equal(itch, after.Rows.Count(r => r[code] == "ITCHC01"));
            Assert.Equal(itch, after.Rows.Count(r => r[code] == "ITCHC02"));
            Assert.Equal(before.Rows.Select(r => string.Join("\u0001", r)),
                after.Rows.Where(r => !r[code].StartsWith("ITCHC", StringComparison.Ordinal)).Select(r => string.Join("\u0001", r)));
            Assert.Equal(File.ReadAllBytes(Path.Combine(plain, "adsl.csv")), File.ReadAllBytes(Path.Combine(loaded, "adsl.csv")));
        }
        finally
        {
            if (Directory.Exists(plain)) Directory.Delete(plain, recursive: true);
            if (Directory.Exists(loaded)) Directory.Delete(loaded, recursive: true);
        }
    }

    [Fact]
    public void Negative_copies_are_refused()
    {
        Assert.Throws<DemoStudyException>(() =>
            DemoStudyGenerator.WriteCsv(DemoStudyFiles.NewTempFolder(), new DemoStudyOptions(LoadCopies: -1)));
    }
}
