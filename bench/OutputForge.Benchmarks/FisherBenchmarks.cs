using BenchmarkDotNet.Attributes;
using OutputForge.Stats;

namespace OutputForge.Benchmarks;

/// <summary>Fisher's exact test on the tables that used to be slow (all invented; the 2 x 3 and 5 x 3 are the demo disposition tables at 20,000 subjects).</summary>
[MemoryDiagnoser]
public class FisherBenchmarks
{
    private static readonly int[,] CompletionByArm = { { 5679, 5864, 5638 }, { 986, 803, 1030 } };
    private static readonly int[,] ReasonByArm = { { 114, 198, 444 }, { 318, 171, 99 }, { 313, 298, 266 }, { 137, 89, 132 }, { 104, 47, 89 } };
    private static readonly int[,] FiveCategoriesByTwoArms = { { 480, 510, 495, 530, 470 }, { 520, 490, 505, 470, 530 } };
    private static readonly int[,] SparseTenByThree =
    {
        { 60, 55, 60 }, { 10, 12, 8 }, { 5, 3, 6 }, { 2, 4, 3 }, { 1, 2, 1 }, { 3, 1, 2 }, { 0, 2, 1 }, { 1, 0, 2 }, { 2, 1, 0 }, { 1, 2, 0 },
    };
    private static readonly int[,] FiveByFive = { { 5, 3, 4, 6, 2 }, { 4, 5, 3, 2, 6 }, { 3, 6, 5, 4, 2 }, { 6, 2, 4, 5, 3 }, { 2, 4, 6, 3, 5 } };

    [Benchmark(Description = "Fisher 2x3, n=20,000 (completion by arm)")]
    public double TwoByThreeTwentyThousand() => FisherExactTest.Compute(CompletionByArm).PValue;

    [Benchmark(Description = "Fisher 2x5, n=5,000")]
    public double TwoByFiveFiveThousand() => FisherExactTest.Compute(FiveCategoriesByTwoArms).PValue;

    [Benchmark(Description = "Fisher 5x3, n=2,819 (refused: beyond exact reach)")]
    public bool FiveByThreeRefused() => FisherExactTest.Compute(ReasonByArm).IsEstimable;

    [Benchmark(Description = "Fisher 10x3, n=250, sparse")]
    public double SparseTenByThreeTable() => FisherExactTest.Compute(SparseTenByThree).PValue;

    [Benchmark(Description = "Fisher 5x5, n=100")]
    public double FiveByFiveTable() => FisherExactTest.Compute(FiveByFive).PValue;

    [Benchmark(Description = "Fisher 2x2 (25/100 vs 40/100)")]
    public double TwoByTwo() => FisherExactTest.TwoByTwo(25, 75, 40, 60).PValue;

    [Benchmark(Description = "Exact conditional odds ratio (25/100 vs 40/100)")]
    public double ConditionalOddsRatio() => ExactConditionalOddsRatio.Compute(25, 100, 40, 100).Upper;
}
