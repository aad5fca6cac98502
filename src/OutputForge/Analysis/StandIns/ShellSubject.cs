namespace OutputForge.Analysis.StandIns;

/// <summary>
/// One invented subject of a mock shell: its USUBJID, its arm (index into the study spec's
/// treatment.arms), its place among that arm's subjects, and its ADSL values by variable name.
/// </summary>
public sealed class ShellSubject(string id, int arm, int indexInArm, Dictionary<string, string?> values)
{
    public string Id { get; } = id;

    public int Arm { get; } = arm;

    public int IndexInArm { get; } = indexInArm;

    /// <summary>A running number unique in the study, for <see cref="StandInNumbers"/>.</summary>
    public int Number => Arm * 1000 + IndexInArm;

    /// <summary>ADSL values by variable (case-insensitive), USUBJID included.</summary>
    public Dictionary<string, string?> Values { get; } = values;

    /// <summary>Whether the subject has <paramref name="variable"/> at all (a missing value set on purpose counts).</summary>
    public bool Has(string variable) => Values.ContainsKey(variable);
}
