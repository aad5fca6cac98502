namespace OutputForge.Demo;

/// <summary>ADSL: one row per randomized subject (CDISC ADaM IG v1.3, subject-level analysis dataset).</summary>
internal static class AdslCsv
{
    public const string FileName = "adsl.csv";

    public static IReadOnlyList<string> Columns { get; } =
    [
        "STUDYID", "USUBJID", "SUBJID", "SITEID", "TRT01P", "TRT01PN", "TRT01A", "TRT01AN",
        "RANDFL", "ITTFL", "SAFFL", "EFFFL", "PPROTFL", "AGE", "AGEGR1", "AGEGR1N", "SEX", "RACE", "RACEN",
        "ETHNIC", "REGION1", "STRAT1R", "STRAT2R", "HEIGHTBL", "WEIGHTBL", "BMIBL", "ITCHBL", "DURDIS",
        "RANDDT", "TRTSDT", "TRTEDT", "EOSSTT", "DCSREAS", "EOSDT",
    ];

    public static void Write(string path, IEnumerable<DemoSubject> subjects)
    {
        using var csv = new CsvTableWriter(path, Columns);
        foreach (var s in subjects)
        {
            var elderly = s.Age >= 65;
            csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.SubjectId).Field(s.Site.SiteId)
                .Field(s.Arm.Label).Field(s.Arm.DoseMg)
                .Field(s.Dosed ? s.Arm.Label : null).Field(s.Dosed ? s.Arm.DoseMg : null)
                .Field("Y").Field("Y").Field(DemoValueFormat.Flag(s.Dosed))
                .Field(DemoValueFormat.Flag(s.InEfficacyPopulation)).Field(DemoValueFormat.Flag(s.InPerProtocolPopulation))
                .Field(s.Age).Field(elderly ? ">=65" : "<65").Field(elderly ? 2 : 1)
                .Field(s.Sex).Field(s.Race).Field(s.RaceCode).Field(s.Ethnicity)
                .Field(s.Site.Region).Field(s.StratumRegion).Field(s.Severity)
                .Field(DemoValueFormat.Tenths(s.HeightTenths)).Field(DemoValueFormat.Tenths(s.WeightTenths))
                .Field(DemoValueFormat.Tenths(s.BmiTenths)).Field(DemoValueFormat.Tenths(s.ItchBaselineTenths))
                .Field(DemoValueFormat.Tenths(s.DiseaseYearsTenths))
                .Field(DemoValueFormat.Date(s.RandomizationDate)).Field(DemoValueFormat.Date(s.TreatmentStart))
                .Field(DemoValueFormat.Date(s.TreatmentEnd))
                .Field(s.Completed ? "COMPLETED" : "DISCONTINUED").Field(s.DiscontinuationReason)
                .Field(DemoValueFormat.Date(s.EndOfStudy));
            csv.EndRow();
        }
    }
}
