using System.Text.Json.Nodes;
using OutputForge.Demo;
using OutputForge.Tests.Support;
using Xunit;

namespace OutputForge.Tests.Demo;

/// <summary>
/// The pooled size of the demo study (demo --size pooled), on a reduced number of subjects: the ordinary
/// records are kept exactly, the weekly efficacy parameters and further adverse events are added, the files
/// are deterministic, and the 60-table spec set loads and runs.
/// </summary>
public sealed class PooledDemoStudyTests
{
    private const int Subjects = 200;
    private static readonly string[] Files = ["adsl.csv", "adeff.csv", "adae.csv", "adtte.csv"];

    private static DemoStudyOptions Pooled(int subjects = Subjects) => new(subjects) { Pooled = PooledStudyOptions.Target };

    [Fact]
    public void Ordinary_records_are_kept_and_weekly_parameters_added()
    {
        using var plain = new TempFolder();
        using var pooled = new TempFolder();
        DemoStudyGenerator.WriteCsv(plain.Path, new DemoStudyOptions(Subjects));
        DemoStudyGenerator.WriteCsv(pooled.Path, Pooled());

        Assert.Equal(File.ReadAllBytes(plain.File("adsl.csv")), File.ReadAllBytes(pooled.File("adsl.csv")));
        Assert.Equal(File.ReadAllBytes(plain.File("adtte.csv")), File.ReadAllBytes(pooled.File("adtte.csv")));
        var before = CsvTable.Read(plain.File("adeff.csv"));
        var after = CsvTable.Read(pooled.File("adeff.csv"));
        var ordinary = new HashSet<string>(["ITCH", "ITCHR50", "SGICITCH"]);
        Assert.Equal(before.Rows.Select(r => string.Join("\u0001", r)),
            after.Rows.Where(r => ordinary.Contains(after.Get(r, "PARAMCD"))).Select(r => string.Join("\u0001", r)));

        var weekly = after.Rows.Where(r => !ordinary.Contains(after.Get(r, "PARAMCD"))).ToList();
        var adsl = CsvTable.Read(pooled.File("adsl.csv"));
        var dosed = adsl.Rows.Where(r => adsl.Get(r, "SAFFL") == "Y").ToList();
        var codes = WeeklyEfficacyParameter.All.Select(p => p.Code).ToList();
        Assert.Equal(8, codes.Count);
        Assert.Equal(dosed.Count * codes.Count, weekly.Count(r => after.Get(r, "AVISIT") == "Baseline"));
        Assert.All(weekly, r => Assert.Equal("Y", after.Get(r, "ANL01FL")));
        var completed = dosed.Where(r => adsl.Get(r, "EOSSTT") == "COMPLETED").Select(r => adsl.Get(r, "USUBJID")).ToHashSet();
        foreach (var group in weekly.GroupBy(r => (Subject: after.Get(r, "USUBJID"), Code: after.Get(r, "PARAMCD"))))
        {
            var weeks = group.Select(r => int.Parse(after.Get(r, "AVISITN"), System.Globalization.CultureInfo.InvariantCulture)).ToList();
            Assert.Equal(Enumerable.Range(0, weeks.Count), weeks);
            Assert.True(weeks.Count <= 13);
            if (completed.Contains(group.Key.Subject))
                Assert.Equal(13, weeks.Count);
        }
    }

    [Fact]
    public void Ordinary_adverse_events_are_kept_and_about_ten_per_dosed_subject_reported()
    {
        using var plain = new TempFolder();
        using var pooled = new TempFolder();
        DemoStudyGenerator.WriteCsv(plain.Path, new DemoStudyOptions(Subjects));
        DemoStudyGenerator.WriteCsv(pooled.Path, Pooled());
        var before = CsvTable.Read(plain.File("adae.csv"));
        var after = CsvTable.Read(pooled.File("adae.csv"));
        // AESEQ renumbers when further events come between the ordinary ones; every other field is kept.
        string Key(CsvTable t, string[] r) => string.Join("\u0001", t.Header.Where(h => h != "AESEQ").Select(h => t.Get(r, h)));
        var remaining = after.Rows.Select(r => Key(after, r)).GroupBy(k => k).ToDictionary(g => g.Key, g => g.Count());
        foreach (var key in before.Rows.Select(r => Key(before, r)))
        {
            Assert.True(remaining.TryGetValue(key, out var left) && left > 0, $"ordinary event missing: {key}");
            remaining[key] = left - 1;
        }
        var adsl = CsvTable.Read(pooled.File("adsl.csv"));
        var dosed = adsl.Rows.Count(r => adsl.Get(r, "SAFFL") == "Y");
        // Invented target: 200,000 events for 20,000 subjects, i.e. about 10 per subject (dropouts report fewer).
        var perSubject = after.Rows.Count / (double)dosed;
        Assert.InRange(perSubject, 8.5, 11.5);
    }

    [Fact]
    public void The_same_options_give_the_same_bytes()
    {
        using var first = new TempFolder();
        using var second = new TempFolder();
        DemoStudyGenerator.WriteCsv(first.Path, Pooled(60));
        DemoStudyGenerator.WriteCsv(second.Path, Pooled(60));
        foreach (var file in Files)
            Assert.Equal(File.ReadAllBytes(first.File(file)), File.ReadAllBytes(second.File(file)));
    }

    [Fact]
    public void Too_many_weekly_parameters_are_refused()
    {
        using var folder = new TempFolder();
        Assert.Throws<DemoStudyException>(() => DemoStudyGenerator.WriteCsv(folder.Path,
            new DemoStudyOptions(10) { Pooled = new PooledStudyOptions(WeeklyParameters: 9) }));
    }

    [Fact]
    public void The_pooled_spec_set_has_sixty_tables_of_all_kinds_and_runs()
    {
        using var folder = new TempFolder();
        var log = new StringWriter();
        Assert.Equal(0, OutputForge.Cli.Program.Run(["demo", "--out", folder.Path, "--size", "pooled", "--subjects", "150", "--no-tables"], log));
        var studyFile = folder.File(Path.Combine("specs", "pooled", "study.json"));
        var tables = JsonNode.Parse(File.ReadAllText(studyFile))!["tables"]!.AsArray().Select(t => t!.GetValue<string>()).ToList();
        Assert.Equal(PooledSpecSet.TableCount, tables.Count);
        var specs = tables.Select(t => JsonNode.Parse(File.ReadAllText(Path.Combine(Path.GetDirectoryName(studyFile)!, t)))!).ToList();
        Assert.Equal(60, specs.Select(s => s["id"]!.GetValue<string>()).Distinct().Count());
        Assert.Equal(OutputForge.Kinds.TableKinds.Names.Order(StringComparer.Ordinal),
            specs.Select(s => s["kind"]!.GetValue<string>()).Distinct().Order(StringComparer.Ordinal));
        Assert.False(Directory.Exists(folder.File("output")));

        var output = folder.File("output");
        Assert.Equal(0, OutputForge.Cli.Program.Run(
            ["run", "--spec", studyFile, "--data", folder.File("data"), "--out", output, "--format", "txt", "--timestamp", "2026-12-01T00:00:00Z"], log));
        Assert.Equal(60, Directory.GetFiles(output, "*.txt").Length);
    }
}
