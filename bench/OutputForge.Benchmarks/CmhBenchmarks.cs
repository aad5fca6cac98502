using BenchmarkDotNet.Attributes;
using OutputForge.Stats;

namespace OutputForge.Benchmarks;

/// <summary>The generalized Cochran-Mantel-Haenszel statistics over four invented strata of a 3 x 4 table.</summary>
public class CmhBenchmarks
{
    private static readonly IReadOnlyList<int[,]> Strata =
    [
        new[,] { { 12, 15, 9, 4 }, { 10, 11, 14, 6 }, { 7, 13, 12, 9 } },
        new[,] { { 20, 18, 11, 3 }, { 16, 17, 15, 5 }, { 12, 14, 19, 8 } },
        new[,] { { 5, 9, 6, 2 }, { 6, 7, 8, 3 }, { 3, 6, 9, 5 } },
        new[,] { { 30, 22, 14, 6 }, { 25, 24, 20, 9 }, { 18, 21, 26, 12 } },
    ];

    [Benchmark(Description = "Generalized CMH, 4 strata of 3x4")]
    public double GeneralizedCmh() => GeneralizedCochranMantelHaenszel.Compute(Strata).GeneralAssociation.PValue;
}
