namespace OutputForge.Choices;

/// <summary>Each arm on its own, all arms combined, or the one arm a spec names.</summary>
public enum ArmChoiceKind
{
    AnyArm,
    Total,
    Arm,
}
