using System.Globalization;

namespace OutputForge.Tests.Demo;

public sealed class AdeffContentTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;
    private CsvTable Adeff => _study.Adeff;

    public AdeffContentTests(DemoStudyFiles study) => _study = study;

    private IEnumerable<string[]> Itch => Adeff.Rows.Where(r => Adeff.Get(r, "PARAMCD") == "ITCH");

    [Fact]
    public void Columns_are_in_the_documented_order()
    {
        Assert.Equal(
            ["STUDYID", "USUBJID", "TRT01P", "TRT01PN", "PARAMCD", "PARAM", "PARAMN", "AVISIT", "AVISITN", "ADT", "ADY",
             "AVAL", "AVALC", "BASE", "CHG", "PCHG", "ABLFL", "ANL01FL", "CRIT1", "CRIT1FL", "DTYPE"],
            Adeff.Header);
    }

    [Fact]
    public void Parameters_and_visits_are_the_documented_ones()
    {
        var parameters = Adeff.Rows.Select(r => (Adeff.Get(r, "PARAMCD"), Adeff.Get(r, "PARAM"), Adeff.Get(r, "PARAMN"))).Distinct().ToList();
        Assert.Equal(3, parameters.Count);
        Assert.Contains(("ITCH", "Weekly Mean Itch Score (0-10)", "1"), parameters);
        Assert.Contains(("ITCHR50", "Itch Responder (>=50% Reduction from Baseline)", "2"), parameters);
        Assert.Contains(("SGICITCH", "Subject Global Impression of Change in Itch (1-7)", "3"), parameters);

        var itchVisits = Itch.Select(r => (Adeff.Get(r, "AVISIT"), Adeff.Get(r, "AVISITN"))).Distinct().OrderBy(v => int.Parse(v.Item2, CultureInfo.InvariantCulture));
        Assert.Equal([("Baseline", "0"), ("Week 2", "2"), ("Week 4", "4"), ("Week 8", "8"), ("Week 12", "12")], itchVisits);
        var responderVisits = Adeff.Rows.Where(r => Adeff.Get(r, "PARAMCD") == "ITCHR50").Select(r => Adeff.Get(r, "AVISIT")).Distinct().Order();
        Assert.Equal(["Week 12", "Week 4", "Week 8"], responderVisits);
    }

    [Fact]
    public void Every_subject_has_one_baseline_equal_to_ITCHBL()
    {
        var baselines = Itch.Where(r => Adeff.Get(r, "ABLFL") == "Y").ToList();
        Assert.Equal(450, baselines.Count);
        var itchBaseline = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"), r => _study.Adsl.Get(r, "ITCHBL"));
        foreach (var row in baselines)
        {
            Assert.Equal("0", Adeff.Get(row, "AVISITN"));
            Assert.Equal(itchBaseline[Adeff.Get(row, "USUBJID")], Adeff.Get(row, "AVAL"));
        }
        foreach (var row in Itch)
            Assert.Equal(itchBaseline[Adeff.Get(row, "USUBJID")], Adeff.Get(row, "BASE"));
    }

    [Fact]
    public void Change_and_percent_change_are_derived_from_the_printed_values()
    {
        foreach (var row in Itch.Where(r => Adeff.Get(r, "AVISITN") != "0"))
        {
            var aval = CsvTable.Number(Adeff.Get(row, "AVAL"));
            var baseline = CsvTable.Number(Adeff.Get(row, "BASE"));
            Assert.InRange(aval, 0m, 10m);
            Assert.Equal(aval - baseline, CsvTable.Number(Adeff.Get(row, "CHG")));
            Assert.Equal(Math.Round(100m * (aval - baseline) / baseline, 1, MidpointRounding.AwayFromZero), CsvTable.Number(Adeff.Get(row, "PCHG")));
            Assert.Equal("", Adeff.Get(row, "ABLFL"));
        }
    }

    [Fact]
    public void Responder_records_follow_the_50_percent_rule()
    {
        var itchByKey = Itch.Where(r => Adeff.Get(r, "ANL01FL") == "Y")
            .ToDictionary(r => (Adeff.Get(r, "USUBJID"), Adeff.Get(r, "AVISITN")));
        var responders = Adeff.Rows.Where(r => Adeff.Get(r, "PARAMCD") == "ITCHR50").ToList();
        Assert.NotEmpty(responders);
        foreach (var row in responders)
        {
            var itch = itchByKey[(Adeff.Get(row, "USUBJID"), Adeff.Get(row, "AVISITN"))];
            var responder = CsvTable.Number(Adeff.Get(itch, "PCHG")) <= -50m;
            Assert.Equal(responder ? "1" : "0", Adeff.Get(row, "AVAL"));
            Assert.Equal(responder ? "Y" : "N", Adeff.Get(row, "AVALC"));
            Assert.Equal(responder ? "Y" : "N", Adeff.Get(row, "CRIT1FL"));
            Assert.Equal("At least 50% reduction from baseline in weekly mean itch score", Adeff.Get(row, "CRIT1"));
            Assert.Equal(Adeff.Get(itch, "ADT"), Adeff.Get(row, "ADT"));
        }
        var expected = itchByKey.Keys.Count(k => k.Item2 is "4" or "8" or "12");
        Assert.Equal(expected, responders.Count);
    }

    [Fact]
    public void At_most_one_analysis_record_per_subject_parameter_and_visit()
    {
        var groups = Adeff.Rows.Where(r => Adeff.Get(r, "ANL01FL") == "Y")
            .GroupBy(r => (Adeff.Get(r, "USUBJID"), Adeff.Get(r, "PARAMCD"), Adeff.Get(r, "AVISITN")));
        Assert.All(groups, g => Assert.Single(g));
        // Repeated assessments are kept but not flagged for analysis.
        Assert.All(Adeff.Column("ANL01FL"), f => Assert.Contains(f, new[] { "Y", "" }));
    }

    [Fact]
    public void Study_day_counts_from_the_first_dose_without_a_day_zero()
    {
        var firstDose = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"), r => _study.Adsl.Get(r, "TRTSDT"));
        foreach (var row in Adeff.Rows)
        {
            var start = firstDose[Adeff.Get(row, "USUBJID")];
            if (start == "")
            {
                Assert.Equal("", Adeff.Get(row, "ADY"));
                continue;
            }
            var offset = CsvTable.Date(Adeff.Get(row, "ADT")).DayNumber - CsvTable.Date(start).DayNumber;
            Assert.Equal((offset >= 0 ? offset + 1 : offset).ToString(CultureInfo.InvariantCulture), Adeff.Get(row, "ADY"));
        }
    }

    [Fact]
    public void Some_visits_are_missed_without_dropping_out()
    {
        // Completers with fewer than four post-baseline analysis values had an intermittent missed visit.
        var completers = _study.Adsl.Rows.Where(r => _study.Adsl.Get(r, "EOSSTT") == "COMPLETED")
            .Select(r => _study.Adsl.Get(r, "USUBJID")).ToHashSet();
        var postBaseline = Itch.Where(r => Adeff.Get(r, "AVISITN") != "0" && Adeff.Get(r, "ANL01FL") == "Y")
            .GroupBy(r => Adeff.Get(r, "USUBJID")).ToDictionary(g => g.Key, g => g.Count());
        var withGap = completers.Count(id => postBaseline.GetValueOrDefault(id) < 4);
        Assert.InRange(withGap, 1, completers.Count / 5);
    }
}
