namespace OutputForge.Pipeline;

/// <summary>
/// The garbage collector's work so far in this process, for the --verbose log: with the datasets of a large
/// study live, collections can cost as much as an analysis, so the run reports them beside its stage timings.
/// </summary>
internal static class CollectorFacts
{
    public static string Describe() =>
        $"gc: {GC.CollectionCount(0)} gen0, {GC.CollectionCount(1)} gen1, {GC.CollectionCount(2)} gen2 collections, " +
        $"paused {GC.GetTotalPauseDuration().TotalMilliseconds:0} ms, {GC.GetTotalAllocatedBytes() / 1e6:0} MB allocated, " +
        $"{GC.GetGCMemoryInfo().PromotedBytes / 1e6:0} MB kept by the last collection";
}
