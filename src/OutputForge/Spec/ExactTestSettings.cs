namespace OutputForge.Spec;

/// <summary>
/// The study's "exactTests": for an r x c table too large for exact enumeration, Fisher's exact test reports a
/// seeded Monte Carlo estimate ("monte-carlo", the default) or NE ("not-estimable", for a SAP that allows no estimate).
/// </summary>
public sealed class ExactTestSettings
{
    public const string MonteCarlo = "monte-carlo";
    public const string NotEstimable = "not-estimable";

    public string Fallback { get; init; } = MonteCarlo;

    public int? Samples { get; init; }

    public long? Seed { get; init; }
}
