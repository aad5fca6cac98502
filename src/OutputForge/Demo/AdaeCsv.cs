namespace OutputForge.Demo;

/// <summary>ADAE: adverse events of the safety population in the ADaM occurrence data structure (OCCDS).</summary>
internal static class AdaeCsv
{
    public const string FileName = "adae.csv";

    public static IReadOnlyList<string> Columns { get; } =
    [
        "STUDYID", "USUBJID", "TRTA", "TRTAN", "SAFFL", "AESEQ", "AETERM", "AEDECOD", "AEBODSYS",
        "AESEV", "AESER", "AEREL", "TRTEMFL", "ASTDT", "AENDT", "ASTDY",
    ];

    public static void Write(string path, IEnumerable<DemoSubject> subjects)
    {
        using var csv = new CsvTableWriter(path, Columns);
        foreach (var s in subjects)
        {
            if (!s.Dosed || s.AdverseEvents.Count == 0) continue;
            // AESEQ numbers a subject's events in order of onset (ties by preferred term).
            var ordered = s.AdverseEvents
                .OrderBy(e => e.Start)
                .ThenBy(e => e.Term.PreferredTerm, StringComparer.Ordinal)
                .ToList();
            for (var i = 0; i < ordered.Count; i++)
            {
                var e = ordered[i];
                csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.Arm.Label).Field(s.Arm.DoseMg)
                    .Field("Y").Field(i + 1).Field(e.VerbatimTerm).Field(e.Term.PreferredTerm).Field(e.Term.BodySystem)
                    .Field(e.Severity).Field(DemoValueFormat.Flag(e.Serious)).Field(e.Relationship)
                    .Field(e.TreatmentEmergent ? "Y" : null)
                    .Field(DemoValueFormat.Date(e.Start)).Field(DemoValueFormat.Date(e.End)).Field(s.StudyDay(e.Start));
                csv.EndRow();
            }
        }
    }
}
