namespace OutputForge.Analysis;

/// <summary>
/// A treatment arm of a population: its value in the data, display label, order and whether it
/// is the control. <see cref="Key"/> is the stable results key (label in lower case with dashes).
/// </summary>
public sealed record TreatmentArm(string Value, string Label, double Order, bool IsControl)
{
    public string Key => ResultKeys.FromLabel(Value);
}
