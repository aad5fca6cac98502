using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using OutputForge.Stats;

namespace OutputForge.Benchmarks;

/// <summary>The evenly spread 10 x 3 table with n = 250, the hard case of the r x c network: seconds per call, so few iterations.</summary>
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class FisherEvenlySpreadBenchmark
{
    private static readonly int[,] EvenlySpread =
    {
        { 14, 15, 11 }, { 10, 9, 13 }, { 7, 10, 8 }, { 13, 8, 5 }, { 4, 9, 10 }, { 8, 6, 11 }, { 10, 12, 7 }, { 4, 3, 8 }, { 6, 10, 5 }, { 2, 4, 8 },
    };

    [Benchmark(Description = "Fisher 10x3, n=250, evenly spread")]
    public double EvenlySpreadTenByThree() => FisherExactTest.Compute(EvenlySpread).PValue;
}
