using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Layout;

/// <summary>The study's arm groups (treatment.groups), keyed like the result columns (the arm value as a results key).</summary>
public static class StudyColumnGroups
{
    public static IReadOnlyList<ColumnGroup> Of(StudySpec study) =>
        (study.Treatment.Groups ?? [])
            .Select((g, i) => new ColumnGroup(g.Label, g.Arms.Select(ResultKey.Part).ToList(), $"/treatment/groups/{i}"))
            .ToList();
}
