using OutputForge.Spec;

namespace OutputForge.Layout;

/// <summary>The study identification of the page header: "QF217-301 (Sponsor)".</summary>
public static class StudyLine
{
    public static string Of(StudySpec study) =>
        $"{study.Study.Id}" + (study.Study.Sponsor is null ? string.Empty : $" ({study.Study.Sponsor})");
}
