using OutputForge.Data;

namespace OutputForge.Analysis.Summaries;

/// <summary>The ADSL row of each subject of a population selection, in the selection's arm order.</summary>
public static class SubjectRows
{
    public static IReadOnlyList<(int Row, TreatmentArm Arm)> Of(Dataset adsl, PopulationSelection selection)
    {
        var subjects = adsl.Get(AdamConformance.SubjectVariable);
        var rows = new List<(int, TreatmentArm)>();
        for (var row = 0; row < adsl.RowCount; row++)
        {
            if (selection.ArmOfSubject.TryGetValue(subjects.GetText(row)!, out var arm))
            {
                rows.Add((row, arm));
            }
        }
        return rows;
    }
}
