namespace OutputForge.Tests.Demo;

/// <summary>ADTTE of the default demo study: structure, derivation from ADSL/ADEFF, and the built-in effect.</summary>
public sealed class AdtteContentTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;
    private CsvTable Adtte => _study.Adtte;

    public AdtteContentTests(DemoStudyFiles study) => _study = study;

    private IEnumerable<string[]> Parameter(string code) => Adtte.Rows.Where(r => Adtte.Get(r, "PARAMCD") == code);

    [Fact]
    public void Every_randomized_subject_has_one_row_per_parameter()
    {
        var subjects = _study.Adsl.Column("USUBJID").ToHashSet();
        foreach (var code in new[] { "TTRESP", "TTDISC" })
        {
            var ids = Parameter(code).Select(r => Adtte.Get(r, "USUBJID")).ToList();
            Assert.Equal(subjects.Count, ids.Count);
            Assert.True(subjects.SetEquals(ids));
        }
    }

    [Fact]
    public void Aval_is_days_from_startdt_to_adt_plus_one_and_cnsr_is_0_or_1()
    {
        foreach (var row in Adtte.Rows)
        {
            var days = CsvTable.Date(Adtte.Get(row, "ADT")).DayNumber - CsvTable.Date(Adtte.Get(row, "STARTDT")).DayNumber + 1;
            Assert.Equal(days.ToString(System.Globalization.CultureInfo.InvariantCulture), Adtte.Get(row, "AVAL"));
            Assert.Contains(Adtte.Get(row, "CNSR"), new[] { "0", "1" });
            Assert.True(days >= 1);
        }
    }

    [Fact]
    public void A_response_event_is_the_first_adeff_value_with_at_least_half_the_baseline_itch_gone()
    {
        var adeff = _study.Adeff;
        var firstResponse = adeff.Rows
            .Where(r => adeff.Get(r, "PARAMCD") == "ITCH" && adeff.Get(r, "ANL01FL") == "Y" && adeff.Get(r, "ABLFL") != "Y")
            .Where(r => CsvTable.Number(adeff.Get(r, "CHG")) * -2 >= CsvTable.Number(adeff.Get(r, "BASE")))
            .GroupBy(r => adeff.Get(r, "USUBJID"))
            .ToDictionary(g => g.Key, g => g.Min(r => CsvTable.Date(adeff.Get(r, "ADT"))));
        foreach (var row in Parameter("TTRESP"))
        {
            var id = Adtte.Get(row, "USUBJID");
            if (firstResponse.TryGetValue(id, out var date))
            {
                Assert.Equal("0", Adtte.Get(row, "CNSR"));
                Assert.Equal(date, CsvTable.Date(Adtte.Get(row, "ADT")));
            }
            else
            {
                Assert.Equal("1", Adtte.Get(row, "CNSR"));
            }
        }
    }

    [Fact]
    public void Discontinued_subjects_have_an_event_at_eosdt()
    {
        var adsl = _study.Adsl;
        var status = adsl.Rows.ToDictionary(r => adsl.Get(r, "USUBJID"), r => (adsl.Get(r, "EOSSTT"), adsl.Get(r, "EOSDT")));
        foreach (var row in Parameter("TTDISC"))
        {
            var (state, end) = status[Adtte.Get(row, "USUBJID")];
            Assert.Equal(state == "DISCONTINUED" ? "0" : "1", Adtte.Get(row, "CNSR"));
            Assert.Equal(end, Adtte.Get(row, "ADT"));
        }
    }

    [Fact]
    public void Active_arms_respond_more_often_than_placebo()
    {
        double Share(string arm) => Parameter("TTRESP").Where(r => Adtte.Get(r, "TRT01P") == arm).Average(r => Adtte.Get(r, "CNSR") == "0" ? 1.0 : 0.0);
        Assert.True(Share("QF-217 10 mg") > Share("Placebo") + 0.1);
        Assert.True(Share("QF-217 30 mg") > Share("Placebo") + 0.1);
    }
}
