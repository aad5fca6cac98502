namespace OutputForge.Demo;

/// <summary>One randomized arm of the demonstration study.</summary>
/// <param name="Index">0 placebo, 1 low dose, 2 high dose; used to index per-arm parameters.</param>
/// <param name="Label">TRT01P / TRT01A text.</param>
/// <param name="DoseMg">TRT01PN / TRT01AN: the daily dose in mg.</param>
internal sealed record TreatmentArm(int Index, string Label, int DoseMg)
{
    public static IReadOnlyList<TreatmentArm> All { get; } =
    [
        new(0, DemoStudyFacts.PlaceboArm, 0),
        new(1, DemoStudyFacts.LowDoseArm, 10),
        new(2, DemoStudyFacts.HighDoseArm, 30),
    ];
}
