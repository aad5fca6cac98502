namespace OutputForge.Demo;

/// <summary>
/// xoshiro256** 1.0 (Blackman and Vigna, "Scrambled linear pseudorandom number generators",
/// ACM TOMS 47(4), 2021). Our own implementation so that the demonstration data do not depend on
/// System.Random, whose algorithm is not guaranteed across .NET versions.
/// </summary>
internal sealed class Xoshiro256StarStar
{
    private ulong _s0, _s1, _s2, _s3;

    public Xoshiro256StarStar(ulong seed)
    {
        var seeder = new SplitMix64(seed);
        _s0 = seeder.Next();
        _s1 = seeder.Next();
        _s2 = seeder.Next();
        _s3 = seeder.Next();
    }

    public ulong NextUInt64()
    {
        var result = RotateLeft(_s1 * 5, 7) * 9;
        var t = _s1 << 17;
        _s2 ^= _s0;
        _s3 ^= _s1;
        _s1 ^= _s2;
        _s0 ^= _s3;
        _s2 ^= t;
        _s3 = RotateLeft(_s3, 45);
        return result;
    }

    /// <summary>Uniform on [0, 1) with 53 random bits (the usual upper-bits conversion).</summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / 9007199254740992.0);

    /// <summary>Uniform integer on [0, bound) without modulo bias (rejection of the short last interval).</summary>
    public int NextInt(int bound)
    {
        if (bound <= 0) throw new ArgumentOutOfRangeException(nameof(bound));
        var range = (ulong)bound;
        var limit = ulong.MaxValue - (ulong.MaxValue % range);
        ulong draw;
        do { draw = NextUInt64(); } while (draw >= limit);
        return (int)(draw % range);
    }

    /// <summary>Uniform integer on [min, max], both ends included.</summary>
    public int NextInt(int min, int max) => min + NextInt(max - min + 1);

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
