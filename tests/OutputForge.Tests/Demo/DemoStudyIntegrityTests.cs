namespace OutputForge.Tests.Demo;

public sealed class DemoStudyIntegrityTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;

    public DemoStudyIntegrityTests(DemoStudyFiles study) => _study = study;

    private IEnumerable<CsvTable> AllTables => [_study.Adsl, _study.Adeff, _study.Adae];

    [Fact]
    public void Every_flag_is_Y_N_or_empty()
    {
        foreach (var table in AllTables)
            foreach (var flag in table.Header.Where(c => c.EndsWith("FL", StringComparison.Ordinal)))
                Assert.All(table.Column(flag), v => Assert.Contains(v, new[] { "Y", "N", "" }));
    }

    [Fact]
    public void Every_row_has_exactly_the_header_width()
    {
        foreach (var table in AllTables)
            Assert.All(table.Rows, r => Assert.Equal(table.Header.Count, r.Length));
    }

    [Fact]
    public void Every_efficacy_and_safety_subject_is_in_ADSL_with_the_same_planned_arm()
    {
        var planned = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"), r => _study.Adsl.Get(r, "TRT01P"));
        foreach (var row in _study.Adeff.Rows)
            Assert.Equal(planned[_study.Adeff.Get(row, "USUBJID")], _study.Adeff.Get(row, "TRT01P"));
        Assert.All(_study.Adae.Column("USUBJID"), id => Assert.True(planned.ContainsKey(id), id));
    }

    [Fact]
    public void No_record_is_dated_after_the_end_of_study()
    {
        var endOfStudy = _study.Adsl.Rows.ToDictionary(r => _study.Adsl.Get(r, "USUBJID"), r => CsvTable.Date(_study.Adsl.Get(r, "EOSDT")));
        foreach (var row in _study.Adeff.Rows)
            Assert.True(CsvTable.Date(_study.Adeff.Get(row, "ADT")) <= endOfStudy[_study.Adeff.Get(row, "USUBJID")]);
        foreach (var row in _study.Adae.Rows)
        {
            var end = endOfStudy[_study.Adae.Get(row, "USUBJID")];
            Assert.True(CsvTable.Date(_study.Adae.Get(row, "ASTDT")) <= end);
            if (_study.Adae.Get(row, "AENDT") != "") Assert.True(CsvTable.Date(_study.Adae.Get(row, "AENDT")) <= end);
        }
    }

    [Fact]
    public void Dates_are_ISO_8601()
    {
        var dateColumns = new[] { (_study.Adsl, new[] { "RANDDT", "TRTSDT", "TRTEDT", "EOSDT" }), (_study.Adeff, new[] { "ADT" }), (_study.Adae, new[] { "ASTDT", "AENDT" }) };
        foreach (var (table, columns) in dateColumns)
            foreach (var column in columns)
                Assert.All(table.Column(column), v => Assert.Matches(@"^(\d{4}-\d{2}-\d{2})?$", v));
    }
}
