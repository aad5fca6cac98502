namespace OutputForge.Demo;

/// <summary>
/// ADTTE: time-to-event data in the ADaM BDS for time-to-event (ADaM IG v1.3 / ADTTE structure), one row
/// per subject and parameter, time from randomization (STARTDT = RANDDT), AVAL = ADT - STARTDT + 1 days,
/// CNSR 0 = event, 1 = censored. Derived only from what the other datasets already hold (no random
/// draws), so it cannot disturb them:
/// TTRESP, time to first itch response: the first post-baseline analysis value (ANL01FL = Y) with at least
/// a 50% reduction from baseline is the event; otherwise censored at the last post-baseline analysis
/// assessment, or at randomization when there is none.
/// TTDISC, time to study discontinuation: EOSDT of a discontinued subject is the event; completers are
/// censored at EOSDT.
/// </summary>
internal static class AdtteCsv
{
    public const string FileName = "adtte.csv";
    public const string ResponseParamCode = "TTRESP";
    public const string ResponseParam = "Time to First Itch Response (>=50% Reduction) (days)";
    public const string DiscontinuationParamCode = "TTDISC";
    public const string DiscontinuationParam = "Time to Study Discontinuation (days)";

    public static IReadOnlyList<string> Columns { get; } =
    [
        "STUDYID", "USUBJID", "TRT01P", "TRT01PN", "PARAMCD", "PARAM", "PARAMN", "STARTDT", "ADT", "AVAL", "CNSR",
        "EVNTDESC", "CNSDTDSC", "SRCDOM", "SRCVAR",
    ];

    public static void Write(string path, IEnumerable<DemoSubject> subjects)
    {
        using var csv = new CsvTableWriter(path, Columns);
        foreach (var s in subjects)
        {
            var response = FirstResponse(s);
            if (response is not null)
            {
                Row(csv, s, ResponseParamCode, ResponseParam, 1, response.Date, false,
                    "FIRST ITCH RESPONSE", null, "ADEFF", "ADT");
            }
            else
            {
                var last = s.ItchAssessments.Where(a => !a.IsBaseline && a.IsAnalysisRecord).Select(a => (DateOnly?)a.Date).Max();
                Row(csv, s, ResponseParamCode, ResponseParam, 1, last ?? s.RandomizationDate, true, null,
                    last is null ? "RANDOMIZATION" : "LAST ITCH ASSESSMENT", last is null ? "ADSL" : "ADEFF", last is null ? "RANDDT" : "ADT");
            }
            Row(csv, s, DiscontinuationParamCode, DiscontinuationParam, 2, s.EndOfStudy, s.Completed,
                s.Completed ? null : "STUDY DISCONTINUATION", s.Completed ? "STUDY COMPLETION" : null, "ADSL", "EOSDT");
        }
    }

    private static ItchAssessment? FirstResponse(DemoSubject s) =>
        s.ItchAssessments
            .Where(a => !a.IsBaseline && a.IsAnalysisRecord && AdeffCsv.IsResponder(a.ValueTenths, s.ItchBaselineTenths))
            .OrderBy(a => a.Date)
            .FirstOrDefault();

    private static void Row(CsvTableWriter csv, DemoSubject s, string code, string name, int number, DateOnly date, bool censored,
        string? eventText, string? censoringText, string sourceDomain, string sourceVariable)
    {
        csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.Arm.Label).Field(s.Arm.DoseMg)
            .Field(code).Field(name).Field(number)
            .Field(DemoValueFormat.Date(s.RandomizationDate)).Field(DemoValueFormat.Date(date))
            .Field(date.DayNumber - s.RandomizationDate.DayNumber + 1).Field(censored ? 1 : 0)
            .Field(eventText).Field(censoringText).Field(sourceDomain).Field(sourceVariable);
        csv.EndRow();
    }
}
