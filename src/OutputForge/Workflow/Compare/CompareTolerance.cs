using System.Globalization;

namespace OutputForge.Workflow.Compare;

/// <summary>
/// How close a QC value must be to the production value. Counts (n, N) must always agree exactly.
/// For other statistics: by default the QC value, rounded as production displays it, must show the
/// same text ("agreement at the displayed precision"); or, with a number, the absolute difference
/// from production's full-precision value must not exceed it.
/// </summary>
public sealed record CompareTolerance(double? Absolute)
{
    public const string DisplayedName = "displayed";

    public static readonly CompareTolerance Displayed = new((double?)null);

    public bool IsDisplayed => Absolute is null;

    /// <summary>Reads the command line's value; null with <paramref name="problem"/> set when it is neither "displayed" nor a number.</summary>
    public static CompareTolerance? Parse(string? text, out string? problem)
    {
        problem = null;
        if (text is null || text.Equals(DisplayedName, StringComparison.OrdinalIgnoreCase))
        {
            return Displayed;
        }
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value >= 0 && double.IsFinite(value))
        {
            return new CompareTolerance(value);
        }
        problem = $"--tolerance: '{text}' is neither '{DisplayedName}' nor a non-negative number (e.g. 0.001)";
        return null;
    }

    public override string ToString() => Absolute is { } a
        ? "absolute difference at most " + a.ToString("R", CultureInfo.InvariantCulture)
        : "agreement at the displayed precision";
}
