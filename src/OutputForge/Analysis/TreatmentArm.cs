using OutputForge.Results;

namespace OutputForge.Analysis;

/// <summary>
/// A treatment arm of a population: its value in the data, display label, order and whether it
/// is the control. <see cref="Key"/> is the stable results key (the value in key form, <see cref="ResultKey.Part"/>).
/// Arms are looked up in every per-subject count, so the key and the hash code are worked out once;
/// the properties are get-only, so that no copy can carry a key or hash of other values.
/// </summary>
public sealed record TreatmentArm(string Value, string Label, double Order, bool IsControl)
{
    private readonly int _hash = HashCode.Combine(Value, Label, Order, IsControl);

    public string Value { get; } = Value;
    public string Label { get; } = Label;
    public double Order { get; } = Order;
    public bool IsControl { get; } = IsControl;

    public string Key { get; } = ResultKey.Part(Value);

    public override int GetHashCode() => _hash;
}
