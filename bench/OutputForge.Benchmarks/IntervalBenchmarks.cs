using BenchmarkDotNet.Attributes;
using OutputForge.Stats;

namespace OutputForge.Benchmarks;

/// <summary>The interval methods every responder table calls once per arm or per comparison.</summary>
public class IntervalBenchmarks
{
    [Benchmark(Description = "Wilson interval (37/120)")]
    public double Wilson() => ProportionInterval.Compute(37, 120, ProportionCiMethod.Wilson).Lower;

    [Benchmark(Description = "Newcombe difference (37/120 vs 22/118)")]
    public double Newcombe() => ProportionDifferenceInterval.Compute(37, 120, 22, 118, DifferenceCiMethod.Newcombe).Lower;

    [Benchmark(Description = "Miettinen-Nurminen difference (37/120 vs 22/118)")]
    public double MiettinenNurminen() => ProportionDifferenceInterval.Compute(37, 120, 22, 118, DifferenceCiMethod.MiettinenNurminen).Lower;
}
