namespace OutputForge.Demo;

/// <summary>ADEFF rows of the pooled study's weekly efficacy parameters (none for the ordinary study), every one flagged for analysis.</summary>
internal static class WeeklyEfficacyRows
{
    public static void Write(CsvTableWriter csv, DemoSubject s)
    {
        foreach (var a in s.WeeklyAssessments)
        {
            var p = a.Parameter;
            csv.Field(DemoStudyFacts.StudyId).Field(s.UniqueSubjectId).Field(s.Arm.Label).Field(s.Arm.DoseMg)
                .Field(p.Code).Field(p.Name).Field(p.Number).Field(a.Week == 0 ? "Baseline" : WeeklyEfficacyParameter.VisitName(a.Week))
                .Field(a.Week).Field(DemoValueFormat.Date(a.Date)).Field(s.StudyDay(a.Date))
                .Field(DemoValueFormat.Tenths(a.ValueTenths)).Field((string?)null).Field(DemoValueFormat.Tenths(a.BaselineTenths));
            if (a.Week == 0)
                csv.Field((string?)null).Field((string?)null).Field("Y");
            else
                csv.Field(DemoValueFormat.Tenths(a.ValueTenths - a.BaselineTenths))
                    .Field(DemoValueFormat.PercentChange(a.ValueTenths - a.BaselineTenths, a.BaselineTenths)).Field((string?)null);
            csv.Field("Y").Field((string?)null).Field((string?)null).Field((string?)null); // ANL01FL, CRIT1, CRIT1FL, DTYPE (observed)
            csv.EndRow();
        }
    }
}
