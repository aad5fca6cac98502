namespace OutputForge.Tests.Demo;

public sealed class AdslContentTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;
    private CsvTable Adsl => _study.Adsl;

    public AdslContentTests(DemoStudyFiles study) => _study = study;

    [Fact]
    public void Columns_are_in_the_documented_order()
    {
        Assert.Equal(
            ["STUDYID", "USUBJID", "SUBJID", "SITEID", "TRT01P", "TRT01PN", "TRT01A", "TRT01AN", "RANDFL", "ITTFL", "SAFFL",
             "EFFFL", "PPROTFL", "AGE", "AGEGR1", "AGEGR1N", "SEX", "RACE", "RACEN", "ETHNIC", "REGION1", "STRAT1R", "STRAT2R",
             "HEIGHTBL", "WEIGHTBL", "BMIBL", "ITCHBL", "DURDIS", "RANDDT", "TRTSDT", "TRTEDT", "EOSSTT", "DCSREAS", "EOSDT"],
            Adsl.Header);
    }

    [Fact]
    public void One_row_per_subject_with_unique_identifiers()
    {
        Assert.Equal(450, Adsl.Rows.Count);
        Assert.Equal(450, Adsl.Column("USUBJID").Distinct().Count());
        foreach (var row in Adsl.Rows)
        {
            Assert.Equal("QF217-301", Adsl.Get(row, "STUDYID"));
            Assert.Equal($"QF217-301-{Adsl.Get(row, "SUBJID")}", Adsl.Get(row, "USUBJID"));
            Assert.StartsWith(Adsl.Get(row, "SITEID") + "-", Adsl.Get(row, "SUBJID"));
        }
    }

    [Fact]
    public void Each_site_belongs_to_one_region()
    {
        var regionsPerSite = Adsl.Rows.GroupBy(r => Adsl.Get(r, "SITEID"))
            .ToDictionary(g => g.Key, g => g.Select(r => Adsl.Get(r, "REGION1")).Distinct().Count());
        Assert.InRange(regionsPerSite.Count, 20, 24);
        Assert.All(regionsPerSite.Values, n => Assert.Equal(1, n));
    }

    [Fact]
    public void Arms_are_balanced_within_every_stratum()
    {
        // Permuted blocks of six (two per arm) per stratum: arm counts within a stratum differ by at most two.
        foreach (var stratum in Adsl.Rows.GroupBy(r => (Adsl.Get(r, "STRAT1R"), Adsl.Get(r, "STRAT2R"))))
        {
            var counts = new[] { "Placebo", "QF-217 10 mg", "QF-217 30 mg" }
                .Select(arm => stratum.Count(r => Adsl.Get(r, "TRT01P") == arm)).ToArray();
            Assert.True(counts.Max() - counts.Min() <= 2, $"stratum {stratum.Key}: {string.Join("/", counts)}");
        }
        Assert.Equal(6, Adsl.Rows.Select(r => (Adsl.Get(r, "STRAT1R"), Adsl.Get(r, "STRAT2R"))).Distinct().Count());
    }

    [Fact]
    public void Planned_and_actual_treatment_codes_match_their_labels()
    {
        var doses = new Dictionary<string, string> { ["Placebo"] = "0", ["QF-217 10 mg"] = "10", ["QF-217 30 mg"] = "30" };
        foreach (var row in Adsl.Rows)
        {
            Assert.Equal(doses[Adsl.Get(row, "TRT01P")], Adsl.Get(row, "TRT01PN"));
            var dosed = Adsl.Get(row, "SAFFL") == "Y";
            Assert.Equal(dosed ? Adsl.Get(row, "TRT01P") : "", Adsl.Get(row, "TRT01A"));
            Assert.Equal(dosed ? Adsl.Get(row, "TRT01PN") : "", Adsl.Get(row, "TRT01AN"));
            Assert.Equal(dosed, Adsl.Get(row, "TRTSDT") != "");
            Assert.Equal(dosed, Adsl.Get(row, "TRTEDT") != "");
        }
    }

    [Fact]
    public void Population_flags_nest_as_defined()
    {
        Assert.All(Adsl.Column("RANDFL"), f => Assert.Equal("Y", f));
        Assert.All(Adsl.Column("ITTFL"), f => Assert.Equal("Y", f));
        var undosed = Adsl.Column("SAFFL").Count(f => f == "N");
        Assert.InRange(undosed, 1, 12);

        var withPostBaselineItch = _study.Adeff.Rows
            .Where(r => _study.Adeff.Get(r, "PARAMCD") == "ITCH" && _study.Adeff.Get(r, "AVISITN") != "0"
                        && _study.Adeff.Get(r, "ANL01FL") == "Y")
            .Select(r => _study.Adeff.Get(r, "USUBJID")).ToHashSet();
        foreach (var row in Adsl.Rows)
        {
            var expectedEfficacy = Adsl.Get(row, "SAFFL") == "Y" && withPostBaselineItch.Contains(Adsl.Get(row, "USUBJID"));
            Assert.Equal(expectedEfficacy ? "Y" : "N", Adsl.Get(row, "EFFFL"));
            if (Adsl.Get(row, "PPROTFL") == "Y") Assert.Equal("Y", Adsl.Get(row, "EFFFL"));
        }
        var perProtocolExcluded = Adsl.Column("PPROTFL").Count(f => f == "N") / 450.0;
        Assert.InRange(perProtocolExcluded, 0.04, 0.14);
    }

    [Fact]
    public void Demographics_are_in_range_and_consistent()
    {
        string[] races = ["WHITE", "BLACK OR AFRICAN AMERICAN", "ASIAN", "AMERICAN INDIAN OR ALASKA NATIVE", "MULTIPLE"];
        string[] ethnicities = ["HISPANIC OR LATINO", "NOT HISPANIC OR LATINO", "NOT REPORTED", ""];
        foreach (var row in Adsl.Rows)
        {
            var age = int.Parse(Adsl.Get(row, "AGE"), System.Globalization.CultureInfo.InvariantCulture);
            Assert.InRange(age, 18, 85);
            Assert.Equal(age >= 65 ? ">=65" : "<65", Adsl.Get(row, "AGEGR1"));
            Assert.Equal(age >= 65 ? "2" : "1", Adsl.Get(row, "AGEGR1N"));
            Assert.Contains(Adsl.Get(row, "SEX"), new[] { "F", "M" });
            var race = Array.IndexOf(races, Adsl.Get(row, "RACE"));
            Assert.True(race >= 0, Adsl.Get(row, "RACE"));
            Assert.Equal((race + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), Adsl.Get(row, "RACEN"));
            Assert.Contains(Adsl.Get(row, "ETHNIC"), ethnicities);
        }
        Assert.InRange(Adsl.Column("REGION1").Zip(Adsl.Column("STRAT1R")).Count(p => p.First != p.Second), 1, 14);
    }

    [Fact]
    public void Body_mass_index_is_computed_from_the_recorded_height_and_weight()
    {
        var missing = 0;
        foreach (var row in Adsl.Rows)
        {
            var height = Adsl.Get(row, "HEIGHTBL");
            var weight = Adsl.Get(row, "WEIGHTBL");
            if (height == "" || weight == "")
            {
                missing++;
                Assert.Equal("", Adsl.Get(row, "BMIBL"));
                continue;
            }
            var meters = CsvTable.Number(height) / 100m;
            var expected = Math.Round(CsvTable.Number(weight) / (meters * meters), 1, MidpointRounding.AwayFromZero);
            Assert.Equal(expected, CsvTable.Number(Adsl.Get(row, "BMIBL")));
        }
        Assert.InRange(missing, 1, 20);
    }

    [Fact]
    public void Baseline_itch_matches_the_severity_stratum()
    {
        foreach (var row in Adsl.Rows)
        {
            var itch = CsvTable.Number(Adsl.Get(row, "ITCHBL"));
            Assert.InRange(itch, 0m, 10m);
            if (Adsl.Get(row, "STRAT2R") == "Severe") Assert.True(itch >= 7m);
            else Assert.True(itch < 7m && Adsl.Get(row, "STRAT2R") == "Moderate");
        }
    }

    [Fact]
    public void Disposition_is_consistent_and_dates_are_ordered()
    {
        string[] reasons = ["ADVERSE EVENT", "LACK OF EFFICACY", "WITHDRAWAL BY SUBJECT", "LOST TO FOLLOW-UP", "PHYSICIAN DECISION"];
        foreach (var row in Adsl.Rows)
        {
            var completed = Adsl.Get(row, "EOSSTT") == "COMPLETED";
            Assert.True(completed || Adsl.Get(row, "EOSSTT") == "DISCONTINUED");
            if (completed) Assert.Equal("", Adsl.Get(row, "DCSREAS"));
            else Assert.Contains(Adsl.Get(row, "DCSREAS"), reasons);

            var randomized = CsvTable.Date(Adsl.Get(row, "RANDDT"));
            var end = CsvTable.Date(Adsl.Get(row, "EOSDT"));
            Assert.True(randomized <= end);
            if (Adsl.Get(row, "TRTSDT") == "") continue;
            var first = CsvTable.Date(Adsl.Get(row, "TRTSDT"));
            var last = CsvTable.Date(Adsl.Get(row, "TRTEDT"));
            Assert.True(randomized <= first && first <= last && last <= end, Adsl.Get(row, "USUBJID"));
        }
        // Design target of the invented study: about 12-15% discontinue over 12 weeks.
        var discontinued = Adsl.Column("EOSSTT").Count(s => s == "DISCONTINUED") / 450.0;
        Assert.InRange(discontinued, 0.09, 0.18);
    }

    [Fact]
    public void Adverse_event_dropouts_are_commonest_at_30_mg_and_lack_of_efficacy_on_placebo()
    {
        int Count(string arm, string reason) =>
            Adsl.Rows.Count(r => Adsl.Get(r, "TRT01P") == arm && Adsl.Get(r, "DCSREAS") == reason);
        Assert.True(Count("QF-217 30 mg", "ADVERSE EVENT") > Count("Placebo", "ADVERSE EVENT"));
        Assert.True(Count("Placebo", "LACK OF EFFICACY") > Count("QF-217 30 mg", "LACK OF EFFICACY"));
    }
}
