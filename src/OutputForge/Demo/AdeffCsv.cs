namespace OutputForge.Demo;

/// <summary>
/// ADEFF: efficacy data in the ADaM basic data structure (BDS), one row per subject, parameter and
/// assessment: the weekly mean itch score (ITCH) and the derived 50% responder status (ITCHR50).
/// </summary>
internal static class AdeffCsv
{
    public const string FileName = "adeff.csv";
    public const string ItchParamCode = "ITCH";
    public const string ItchParam = "Weekly Mean Itch Score (0-10)";
    public const string ResponderParamCode = "ITCHR50";
    public const string ResponderParam = "Itch Responder (>=50% Reduction from Baseline)";
    public const string ResponderCriterion = "At least 50% reduction from baseline in weekly mean itch score";

    public static IReadOnlyList<string> Columns { get; } =
    [
        "STUDYID", "USUBJID", "TRT01P", "TRT01PN", "PARAMCD", "PARAM", "PARAMN", "AVISIT", "AVISITN",
        "ADT", "ADY", "AVAL", "AVALC", "BASE", "CHG", "PCHG", "ABLFL", "ANL01FL", "CRIT1", "CRIT1FL", "DTYPE",
    ];

    /// <summary>Writes ADEFF; <paramref name="loadCopies"/> extra copies of each subject's ITCH rows, under the
    /// parameters ITCHC01, ITCHC02, ..., only enlarge the file for load measurements (no demo table reads them).</summary>
    public static void Write(string path, IEnumerable<DemoSubject> subjects, int loadCopies = 0)
    {
        using var csv = new CsvTableWriter(path, Columns);
        foreach (var s in subjects)
        {
            var baseline = s.ItchBaselineTenths;
            WriteItch(csv, s, ItchParamCode, ItchParam, 1);

            foreach (var a in s.ItchAssessments)
            {
                if (a.IsBaseline || !a.IsAnalysisRecord || !StudySchedule.IsResponderVisit(a.VisitNumber)) continue;
                var responder = IsResponder(a.ValueTenths, baseline);
                Start(csv, s, ResponderParamCode, ResponderParam, 2, a);
                csv.Field(responder ? 1 : 0).Field(DemoValueFormat.Flag(responder))
                    .Field((string?)null).Field((string?)null).Field((string?)null).Field((string?)null)
                    .Field("Y").Field(ResponderCriterion).Field(DemoValueFormat.Flag(responder)).Field((string?)null);
                csv.EndRow();
            }

            ImpressionOfChangeCsv.Write(csv, s);

            for (var copy = 1; copy <= loadCopies; copy++)
            {
                WriteItch(csv, s, $"ITCHC{copy:00}", $"{ItchParam}, load copy {copy}", 100 + copy);
            }
            WeeklyEfficacyRows.Write(csv, s);
        }
    }

    private static void WriteItch(CsvTableWriter csv, DemoSubject s, string code, string name, int number)
    {
        var baseline = s.ItchBaselineTenths;
        foreach (var a in s.ItchAssessments)
        {
            Start(csv, s, code, name, number, a);
            csv.Field(DemoValueFormat.Tenths(a.ValueTenths)).Field((string?)null).Field(DemoValueFormat.Tenths(baseline));
            if (a.IsBaseline)
                csv.Field((string?)null).Field((string?)null).Field("Y");
            else
                csv.Field(DemoValueFormat.Tenths(a.ValueTenths - baseline))
                    .Field(DemoValueFormat.PercentChange(a.ValueTenths - baseline, baseline)).Field((string?)null);
            csv.Field(a.IsAnalysisRecord ? "Y" : null).Field((string?)null).Field((string?)null).Field((string?)null);
            csv.EndRow();
        }
    }

    /// <summary>At least a 50% reduction: (base - value) / base >= 0.5, evaluated exactly in tenths.</summary>
    public static bool IsResponder(int valueTenths, int baselineTenths) => 2 * (baselineTenths - valueTenths) >= baselineTenths;

    private static void Start(CsvTableWriter csv, DemoSubject s, string code, string name, int number, ItchAssessment a) =>
        csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.Arm.Label).Field(s.Arm.DoseMg)
            .Field(code).Field(name).Field(number).Field(a.VisitName).Field(a.VisitNumber)
            .Field(DemoValueFormat.Date(a.Date)).Field(s.StudyDay(a.Date));
}
