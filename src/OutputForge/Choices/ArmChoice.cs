namespace OutputForge.Choices;

/// <summary>
/// Which arms a count is taken over where a spec names "any-arm", "total" or one arm by its value in the data (the
/// adverse event sort column and frequency threshold). Read once, when the spec loads; <see cref="Text"/> keeps what the
/// spec wrote, for messages.
/// </summary>
public sealed record ArmChoice(ArmChoiceKind Kind, string Text)
{
    public const string AnyArmName = "any-arm";
    public const string TotalName = "total";

    public static readonly ArmChoice AnyArm = new(ArmChoiceKind.AnyArm, AnyArmName);
    public static readonly ArmChoice Total = new(ArmChoiceKind.Total, TotalName);

    public static ArmChoice Parse(string text) => text switch
    {
        AnyArmName => AnyArm,
        TotalName => Total,
        _ => new ArmChoice(ArmChoiceKind.Arm, text),
    };
}
