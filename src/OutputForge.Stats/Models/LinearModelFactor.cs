namespace OutputForge.Stats.Models;

/// <summary>
/// A class (categorical) covariate of a linear model: its levels in order and each observation's
/// level index. The first level is the reference of the reference coding (its effect is zero).
/// </summary>
public sealed record LinearModelFactor(string Name, IReadOnlyList<string> Levels, IReadOnlyList<int> LevelOfRow)
{
    public int LevelIndex(string level)
    {
        for (var i = 0; i < Levels.Count; i++)
        {
            if (string.Equals(Levels[i], level, StringComparison.Ordinal))
            {
                return i;
            }
        }
        throw new ArgumentException($"'{level}' is not a level of {Name}.", nameof(level));
    }
}

/// <summary>A numeric covariate of a linear model: its name and one value per observation.</summary>
public sealed record LinearModelCovariate(string Name, IReadOnlyList<double> Values);
