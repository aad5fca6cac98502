using OutputForge.Stats.Contingency;
using OutputForge.Stats.Proportions;

namespace OutputForge.Stats.Exact;

/// <summary>How many tables to sample and from which seed, for the Monte Carlo estimate of Fisher's exact p-value.</summary>
public sealed record FisherMonteCarloSettings(int Samples, ulong Seed)
{
    /// <summary>100,000 tables: the 99% interval of a p-value near 0.05 is then about +-0.002 wide (common practice).</summary>
    public const int DefaultSamples = 100_000;

    public const ulong DefaultSeed = 20261201;

    public static readonly FisherMonteCarloSettings Default = new(DefaultSamples, DefaultSeed);
}

/// <summary>A Monte Carlo estimate of Fisher's exact p-value: the share of sampled tables no more probable than the observed one, with its 99% interval.</summary>
public sealed record FisherMonteCarloEstimate(double PValue, double Lower, double Upper, int AtMostAsProbable, int Samples, ulong Seed);

/// <summary>
/// Fisher's exact test by Monte Carlo (Agresti A, Wackerly DD, Boyett JM (1979) Exact conditional tests for
/// cross-classifications: approximation of attained significance levels, Psychometrika 44:75-83), for tables beyond
/// exact enumeration: tables with the observed margins are sampled with their probabilities under independence
/// (<see cref="RandomTableWithMargins"/>, Patefield 1981), and the p-value is estimated by the share X/B of the B
/// sampled tables that are no more probable than the observed one (with the relative tolerance of the exact test).
/// X is binomial(B, p), so the exact (Clopper-Pearson) 99% interval of X/B is an interval for the exact p-value.
/// The same table, number of samples and seed give the same estimate on every machine.
/// </summary>
public static class FisherMonteCarlo
{
    /// <summary>The level of the interval reported with the estimate.</summary>
    public const double IntervalLevel = 0.99;

    public static FisherMonteCarloEstimate Estimate(int[,] table, FisherMonteCarloSettings settings)
    {
        if (settings.Samples < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(settings), "At least one table must be sampled.");
        }
        TableMargins.Validate(table);
        int r = table.GetLength(0), c = table.GetLength(1);
        var rowTotals = Enumerable.Range(0, r).Select(i => Enumerable.Range(0, c).Sum(j => table[i, j])).ToArray();
        var columnTotals = Enumerable.Range(0, c).Select(j => Enumerable.Range(0, r).Sum(i => table[i, j])).ToArray();
        var sampler = new RandomTableWithMargins(rowTotals, columnTotals);
        // A table's probability with these margins is a constant times 1 / prod n_ij!, so comparing sum log n_ij! compares
        // probabilities; "no more probable" allows the exact test's relative tolerance (log(1 + 1e-7) ~ 1e-7).
        var observed = Score(table, sampler);
        var uniform = new SplitMixUniform(settings.Seed);
        var drawn = new int[r, c];
        var count = 0;
        for (var k = 0; k < settings.Samples; k++)
        {
            sampler.Draw(drawn, uniform);
            if (Score(drawn, sampler) >= observed - FisherExactTest.RelativeTolerance)
            {
                count++;
            }
        }
        var interval = ProportionInterval.Compute(count, settings.Samples, ProportionCiMethod.ClopperPearson, IntervalLevel);
        return new FisherMonteCarloEstimate((double)count / settings.Samples, interval.Lower, interval.Upper, count, settings.Samples, settings.Seed);
    }

    private static double Score(int[,] table, RandomTableWithMargins sampler)
    {
        double sum = 0;
        foreach (var cell in table)
        {
            sum += sampler.LogFactorial(cell);
        }
        return sum;
    }
}
