namespace OutputForge.Stats.Exact;

/// <summary>
/// Seeded uniform numbers in [0, 1) from the SplitMix64 generator (Steele GL, Lea D, Flood CH (2014) Fast splittable
/// pseudorandom number generators, OOPSLA 2014, 453-472): integer arithmetic only, so a seed gives the same
/// sequence on every machine and .NET version (System.Random makes no such promise across versions).
/// </summary>
internal sealed class SplitMixUniform(ulong seed)
{
    private ulong _state = seed;

    /// <summary>The next number: the top 53 bits of the next 64-bit output, times 2^-53.</summary>
    public double Next()
    {
        _state += 0x9E3779B97F4A7C15UL;
        var z = _state;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        z ^= z >> 31;
        return (z >> 11) * (1.0 / (1UL << 53));
    }
}
