namespace OutputForge.Demo;

/// <summary>The planned visits of the 12-week double-blind period (study day of each visit, day 1 = first dose).</summary>
internal static class StudySchedule
{
    public sealed record Visit(string Name, int Number, int TargetDay, int WindowDays);

    public static IReadOnlyList<Visit> PostBaselineVisits { get; } =
    [
        new("Week 2", 2, 15, 2),
        new("Week 4", 4, 29, 3),
        new("Week 8", 8, 57, 3),
        new("Week 12", 12, 85, 3),
    ];

    /// <summary>The visits at which the 50% responder status is derived.</summary>
    public static bool IsResponderVisit(int visitNumber) => visitNumber is 4 or 8 or 12;

    /// <summary>Days between the Week 12 visit and the end-of-study (safety follow-up) visit.</summary>
    public const int FollowUpDays = 14;
}
