namespace OutputForge.Demo;

/// <summary>
/// Identification of the invented demonstration study. Sponsor, compound and study are fictitious;
/// the indication is a real condition chosen only so that the tables read like a plausible trial.
/// </summary>
public static class DemoStudyFacts
{
    public const string StudyId = "QF217-301";
    public const string Sponsor = "Quillfeather Therapeutics";
    public const string Compound = "QF-217";
    public const string Indication = "moderate-to-severe chronic pruritus";
    public const string StudyTitle =
        "A Randomized, Double-Blind, Placebo-Controlled, Parallel-Group Study of QF-217 in Adults with Moderate-to-Severe Chronic Pruritus";

    public const string PlaceboArm = "Placebo";
    public const string LowDoseArm = "QF-217 10 mg";
    public const string HighDoseArm = "QF-217 30 mg";

    /// <summary>The three arm labels in display order (TRT01PN 0, 10, 30).</summary>
    public static IReadOnlyList<string> ArmLabels { get; } = [PlaceboArm, LowDoseArm, HighDoseArm];

    /// <summary>File names written by <see cref="DemoStudyGenerator.WriteCsv"/>, in writing order.</summary>
    public static IReadOnlyList<string> DatasetFiles { get; } = ["adsl.csv", "adeff.csv", "adae.csv", "adtte.csv"];
}
