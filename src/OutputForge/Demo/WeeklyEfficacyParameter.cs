namespace OutputForge.Demo;

/// <summary>
/// An invented patient-reported efficacy score (0-10, lower is better) recorded weekly in the pooled
/// study. Baselines are truncated normal in [1, 10] (so percent change is defined); the Week 12 mean
/// changes by arm are invented, with the same ordering as the itch score.
/// </summary>
/// <param name="Week12MeanChange">Mean change from baseline at Week 12 by arm index (placebo, 10 mg, 30 mg).</param>
internal sealed record WeeklyEfficacyParameter(string Code, string Name, int Number, double BaselineMean, double BaselineSd,
    double[] Week12MeanChange)
{
    public static IReadOnlyList<WeeklyEfficacyParameter> All { get; } =
    [
        new("SLEEP", "Sleep Disturbance Score (0-10)", 11, 6.2, 1.6, [-1.1, -1.8, -2.3]),
        new("WORST", "Worst Daily Itch Intensity (0-10)", 12, 7.6, 1.2, [-1.6, -2.6, -3.2]),
        new("BURN", "Burning Sensation Score (0-10)", 13, 4.8, 1.9, [-0.8, -1.2, -1.5]),
        new("SKNPAIN", "Skin Pain Score (0-10)", 14, 4.1, 1.8, [-0.7, -1.0, -1.4]),
        new("DAYIMP", "Daytime Impact Score (0-10)", 15, 5.9, 1.7, [-1.0, -1.7, -2.1]),
        new("MOOD", "Itch-Related Mood Score (0-10)", 16, 5.2, 1.9, [-0.9, -1.4, -1.8]),
        new("SCRATCH", "Night Scratching Score (0-10)", 17, 6.6, 1.5, [-1.2, -2.0, -2.6]),
        new("FOCUS", "Concentration Difficulty Score (0-10)", 18, 4.5, 1.8, [-0.6, -1.1, -1.3]),
    ];

    /// <summary>Planned study day of the weekly assessment of week <paramref name="week"/> (day 1 = first dose).</summary>
    public static int TargetDay(int week) => 7 * week + 1;

    public const int Weeks = 12;

    public static string VisitName(int week) => $"Week {week}";
}
