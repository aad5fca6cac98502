namespace OutputForge.Demo;

/// <summary>Size and seed of the invented demonstration study.</summary>
/// <param name="Subjects">Number of randomized subjects (1 to <see cref="MaxSubjects"/>).</param>
/// <param name="Seed">Seed of the generator; the same options always give byte-identical files.</param>
/// <param name="LoadCopies">Extra copies of the ITCH records in adeff.csv (parameters ITCHC01, ...), only to enlarge
/// the data for speed measurements; 0 (the default) writes the ordinary study.</param>
public sealed record DemoStudyOptions(int Subjects = 450, ulong Seed = 301, int LoadCopies = 0)
{
    /// <summary>Largest study the generator accepts; keeps subject numbers within each site readable.</summary>
    public const int MaxSubjects = 1_000_000;

    /// <summary>The pooled-analysis enlargement (further weekly parameters, adverse events and the pooled spec set); null for the ordinary study.</summary>
    public PooledStudyOptions? Pooled { get; init; }
}
