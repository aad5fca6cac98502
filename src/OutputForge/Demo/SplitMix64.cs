namespace OutputForge.Demo;

/// <summary>
/// SplitMix64 (Steele, Lea and Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014),
/// used here, as Vigna recommends, only to expand one 64-bit seed into the state of xoshiro256**
/// and to derive independent stream seeds from the study seed.
/// </summary>
internal struct SplitMix64
{
    private ulong _state;

    public SplitMix64(ulong seed) => _state = seed;

    public ulong Next()
    {
        _state += 0x9E3779B97F4A7C15UL;
        var z = _state;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    /// <summary>A seed for one named purpose and index, so that streams do not overlap in use.</summary>
    public static ulong Derive(ulong studySeed, ulong purpose, ulong index)
    {
        var mixer = new SplitMix64(studySeed ^ (purpose * 0xD1B54A32D192ED03UL));
        var first = mixer.Next();
        var second = new SplitMix64(first ^ (index * 0x9E3779B97F4A7C15UL)).Next();
        return second;
    }
}
