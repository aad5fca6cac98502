using System.Globalization;

namespace OutputForge.Choices;

/// <summary>
/// The accepted values of a numeric option and its default, defined once in <see cref="MethodCatalog"/> for the schema
/// (its minimum, maximum and default), the `calc` command's checks and the docs. A bound is exclusive unless marked.
/// </summary>
public sealed record NumberRange(string Key, double Minimum, double Maximum, double Default,
    bool MinimumIncluded = false, bool MaximumIncluded = false)
{
    public bool Contains(double value) =>
        (MinimumIncluded ? value >= Minimum : value > Minimum) && (MaximumIncluded ? value <= Maximum : value < Maximum);

    /// <summary>"between 0.5 and 1 (e.g. 0.95)", "above 0 and at most 0.05 (e.g. 0.001)": for messages.</summary>
    public string Describe() =>
        (MinimumIncluded || MaximumIncluded
            ? $"{(MinimumIncluded ? "at least" : "above")} {Text(Minimum)} and {(MaximumIncluded ? "at most" : "below")} {Text(Maximum)}"
            : $"between {Text(Minimum)} and {Text(Maximum)}")
        + $" (e.g. {Text(Default)})";

    private static string Text(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
