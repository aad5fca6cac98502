namespace OutputForge.Demo;

/// <summary>Draws from the distributions the demonstration study needs, built on <see cref="Xoshiro256StarStar"/>.</summary>
internal static class RandomDraws
{
    /// <summary>True with probability p.</summary>
    public static bool Chance(this Xoshiro256StarStar random, double p) => random.NextDouble() < p;

    /// <summary>
    /// Standard normal deviate by Marsaglia's polar method (Marsaglia and Bray, SIAM Review 6, 1964),
    /// which needs only a logarithm and a square root, both computed portably.
    /// </summary>
    public static double Normal(this Xoshiro256StarStar random)
    {
        while (true)
        {
            var u = 2.0 * random.NextDouble() - 1.0;
            var v = 2.0 * random.NextDouble() - 1.0;
            var s = u * u + v * v;
            if (s > 0 && s < 1)
                return u * Math.Sqrt(-2.0 * PortableMath.Log(s) / s);
        }
    }

    public static double Normal(this Xoshiro256StarStar random, double mean, double sd) => mean + sd * random.Normal();

    /// <summary>Normal deviate redrawn until it falls in [low, high].</summary>
    public static double TruncatedNormal(this Xoshiro256StarStar random, double mean, double sd, double low, double high)
    {
        while (true)
        {
            var x = random.Normal(mean, sd);
            if (x >= low && x <= high) return x;
        }
    }

    /// <summary>Exponential waiting time with the given rate, by inversion.</summary>
    public static double Exponential(this Xoshiro256StarStar random, double rate) =>
        -PortableMath.Log(1.0 - random.NextDouble()) / rate;

    /// <summary>Log-normal deviate given its median and the standard deviation of its logarithm.</summary>
    public static double LogNormal(this Xoshiro256StarStar random, double median, double logSd) =>
        median * PortableMath.Exp(logSd * random.Normal());

    /// <summary>Index chosen with probability proportional to its weight.</summary>
    public static int WeightedIndex(this Xoshiro256StarStar random, ReadOnlySpan<double> weights)
    {
        var total = 0.0;
        foreach (var w in weights) total += w;
        var target = random.NextDouble() * total;
        for (var i = 0; i < weights.Length; i++)
        {
            target -= weights[i];
            if (target < 0) return i;
        }
        return weights.Length - 1;
    }
}
