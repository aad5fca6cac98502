namespace OutputForge.Demo;

/// <summary>
/// The ADEFF rows of the subject global impression of change in itch (PARAMCD SGICITCH): AVAL the
/// code 1-7, AVALC its label, ANL01FL = Y; LOCF records carry DTYPE = LOCF and the date of the
/// impression carried forward. Observed records have DTYPE empty, as ADaM's BDS prescribes.
/// </summary>
internal static class ImpressionOfChangeCsv
{
    public const string ParamCode = "SGICITCH";
    public const string Param = "Subject Global Impression of Change in Itch (1-7)";
    public const int ParamNumber = 3;
    public const string Locf = "LOCF";

    public static readonly IReadOnlyList<string> Labels =
    [
        "Very much better", "Much better", "Minimally better", "No change", "Minimally worse", "Much worse", "Very much worse",
    ];

    public static void Write(CsvTableWriter csv, DemoSubject s)
    {
        foreach (var impression in s.ImpressionsOfChange)
        {
            csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.Arm.Label).Field(s.Arm.DoseMg)
                .Field(ParamCode).Field(Param).Field(ParamNumber).Field(impression.VisitName).Field(impression.VisitNumber)
                .Field(DemoValueFormat.Date(impression.Date)).Field(s.StudyDay(impression.Date))
                .Field(impression.Category).Field(Labels[impression.Category - 1])
                .Field((string?)null).Field((string?)null).Field((string?)null).Field((string?)null)
                .Field("Y").Field((string?)null).Field((string?)null)
                .Field(impression.Imputed ? Locf : null);
            csv.EndRow();
        }
    }
}
