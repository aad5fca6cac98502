namespace OutputForge.Analysis.StandIns;

/// <summary>
/// Varied, repeatable stand-in numbers: a fixed integer hash of (subject, variable) mapped to [0, 1).
/// Varied, so that models on stand-in records are not singular (a covariate that is constant or a
/// straight function of the arm would be); repeatable, so that a shell is the same on every run.
/// </summary>
public static class StandInNumbers
{
    /// <summary>A number in [0, 1) for the subject's running number and a variable's name.</summary>
    public static double Unit(int subject, string variable)
    {
        var x = (uint)subject * 0x9E3779B1u ^ (uint)StableHash(variable) * 0x85EBCA6Bu;
        x ^= x >> 15;
        x *= 0x2C1B3C6Du;
        x ^= x >> 12;
        x *= 0x297A2D39u;
        x ^= x >> 15;
        return x / 4294967296.0;
    }

    /// <summary>A number in [<paramref name="low"/>, <paramref name="high"/>).</summary>
    public static double Between(int subject, string variable, double low, double high) => low + (high - low) * Unit(subject, variable);

    /// <summary>FNV-1a of the upper-case name: unlike string.GetHashCode, the same in every process.</summary>
    private static int StableHash(string text)
    {
        var hash = 2166136261u;
        foreach (var c in text.ToUpperInvariant())
        {
            hash = (hash ^ c) * 16777619u;
        }
        return (int)hash;
    }
}
