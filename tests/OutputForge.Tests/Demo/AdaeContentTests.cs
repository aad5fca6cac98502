using System.Globalization;

namespace OutputForge.Tests.Demo;

public sealed class AdaeContentTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;
    private CsvTable Adae => _study.Adae;

    public AdaeContentTests(DemoStudyFiles study) => _study = study;

    [Fact]
    public void Columns_are_in_the_documented_order()
    {
        Assert.Equal(
            ["STUDYID", "USUBJID", "TRTA", "TRTAN", "SAFFL", "AESEQ", "AETERM", "AEDECOD", "AEBODSYS", "AESEV", "AESER",
             "AEREL", "TRTEMFL", "ASTDT", "AENDT", "ASTDY"],
            Adae.Header);
    }

    [Fact]
    public void Only_dosed_subjects_with_their_actual_treatment()
    {
        var adsl = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"));
        foreach (var row in Adae.Rows)
        {
            var subject = adsl[Adae.Get(row, "USUBJID")];
            Assert.Equal("Y", _study.Adsl.Get(subject, "SAFFL"));
            Assert.Equal("Y", Adae.Get(row, "SAFFL"));
            Assert.Equal(_study.Adsl.Get(subject, "TRT01A"), Adae.Get(row, "TRTA"));
            Assert.Equal(_study.Adsl.Get(subject, "TRT01AN"), Adae.Get(row, "TRTAN"));
        }
    }

    [Fact]
    public void Sequence_numbers_run_from_one_per_subject_in_order_of_onset()
    {
        foreach (var subject in Adae.Rows.GroupBy(r => Adae.Get(r, "USUBJID")))
        {
            var rows = subject.ToList();
            Assert.Equal(Enumerable.Range(1, rows.Count).Select(i => i.ToString(CultureInfo.InvariantCulture)), rows.Select(r => Adae.Get(r, "AESEQ")));
            var onsets = rows.Select(r => CsvTable.Date(Adae.Get(r, "ASTDT"))).ToList();
            Assert.Equal(onsets.Order(), onsets);
        }
    }

    [Fact]
    public void Coded_values_come_from_the_controlled_lists()
    {
        Assert.All(Adae.Column("AESEV"), v => Assert.Contains(v, new[] { "MILD", "MODERATE", "SEVERE" }));
        Assert.All(Adae.Column("AESER"), v => Assert.Contains(v, new[] { "Y", "N" }));
        Assert.All(Adae.Column("AEREL"), v => Assert.Contains(v, new[] { "NOT RELATED", "UNLIKELY RELATED", "POSSIBLY RELATED", "PROBABLY RELATED" }));
        Assert.All(Adae.Column("TRTEMFL"), v => Assert.Contains(v, new[] { "Y", "" }));
        Assert.All(Adae.Column("AETERM"), v => Assert.False(string.IsNullOrWhiteSpace(v)));
    }

    [Fact]
    public void Terms_have_a_realistic_spread()
    {
        var socByTerm = Adae.Rows.GroupBy(r => Adae.Get(r, "AEDECOD"))
            .ToDictionary(g => g.Key, g => g.Select(r => Adae.Get(r, "AEBODSYS")).Distinct().ToList());
        Assert.All(socByTerm.Values, socs => Assert.Single(socs));
        Assert.InRange(socByTerm.Count, 40, 60);
        Assert.InRange(socByTerm.Values.Select(s => s[0]).Distinct().Count(), 10, 14);
        // A body system holding a comma survives the RFC 4180 round trip.
        Assert.Contains("Injury, poisoning and procedural complications", Adae.Column("AEBODSYS"));

        Assert.InRange(Adae.Column("AESER").Count(v => v == "Y"), 1, 20);
        Assert.Contains(Adae.Column("TRTEMFL"), v => v == "");
        var repeats = Adae.Rows.GroupBy(r => (Adae.Get(r, "USUBJID"), Adae.Get(r, "AEDECOD"))).Count(g => g.Count() > 1);
        Assert.True(repeats > 0);
    }

    [Fact]
    public void Treatment_emergence_and_study_days_follow_the_dates()
    {
        var adsl = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"));
        foreach (var row in Adae.Rows)
        {
            var subject = adsl[Adae.Get(row, "USUBJID")];
            var first = CsvTable.Date(_study.Adsl.Get(subject, "TRTSDT"));
            var onset = CsvTable.Date(Adae.Get(row, "ASTDT"));
            var offset = onset.DayNumber - first.DayNumber;
            Assert.Equal((offset >= 0 ? offset + 1 : offset).ToString(CultureInfo.InvariantCulture), Adae.Get(row, "ASTDY"));
            if (onset < first) Assert.Equal("", Adae.Get(row, "TRTEMFL"));
            if (Adae.Get(row, "AENDT") != "") Assert.True(CsvTable.Date(Adae.Get(row, "AENDT")) >= onset);
        }
    }

    [Fact]
    public void Every_adverse_event_dropout_has_an_adverse_event()
    {
        var withEvents = Adae.Column("USUBJID").ToHashSet();
        var dropouts = _study.Adsl.Rows.Where(r => _study.Adsl.Get(r, "DCSREAS") == "ADVERSE EVENT").Select(r => _study.Adsl.Get(r, "USUBJID")).ToList();
        Assert.NotEmpty(dropouts);
        Assert.All(dropouts, id => Assert.Contains(id, withEvents));
    }
}
