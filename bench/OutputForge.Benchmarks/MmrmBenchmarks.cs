using BenchmarkDotNet.Attributes;

namespace OutputForge.Benchmarks;

/// <summary>
/// REML fit of a mixed model for repeated measures with unstructured covariance on an invented study
/// drawn here with a fixed seed: two arms, a baseline, T visits, monotone dropout of about 3% per visit.
/// The target is the pooled demo size, 20,000 subjects x 12 visits, under 5 s.
/// </summary>
public class MmrmBenchmarks
{
    [Params(2000, 20000)]
    public int Subjects { get; set; }

    [Params(12)]
    public int Visits { get; set; }

    private MmrmData _data = null!;
    private MmrmTerm[] _terms = null!;

    [GlobalSetup]
    public void Setup()
    {
        var random = new Random(20261204);
        var visits = Enumerable.Range(1, Visits).Select(v => $"V{v:00}").ToArray();
        var arms = new[] { "P", "A" };
        var subject = new List<string>();
        var visit = new List<int>();
        var arm = new List<int>();
        var baseline = new List<double>();
        var response = new List<double>();
        for (var s = 0; s < Subjects; s++)
        {
            var b = 30 + 6 * Normal(random);
            var subjectEffect = 2 * Normal(random);
            var previous = 0.0;
            for (var v = 0; v < Visits; v++)
            {
                if (v > 0 && random.NextDouble() < 0.03)
                {
                    break;
                }
                previous = 0.6 * previous + Normal(random);
                subject.Add($"S{s}");
                visit.Add(v);
                arm.Add(s % 2);
                baseline.Add(b);
                response.Add(-0.1 * v * (1 + s % 2) - 0.2 * (b - 30) + subjectEffect + previous);
            }
        }
        _data = new MmrmData(response, subject, new LinearModelFactor("VISIT", visits, visit),
            [new LinearModelFactor("ARM", arms, arm)], [new LinearModelCovariate("BASE", baseline)]);
        _terms = [MmrmTerm.Factor("ARM"), MmrmTerm.Factor("VISIT"), MmrmTerm.Numeric("BASE"),
                  MmrmTerm.Interaction("ARM", "VISIT"), MmrmTerm.Slope("BASE", "VISIT")];
    }

    private static double Normal(Random random) =>
        Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());

    [Benchmark(Description = "MMRM REML, unstructured")]
    public double FitUnstructured() => Mmrm.Fit(_data, new MmrmModel(_terms, MmrmCovarianceStructure.Unstructured)).LogLikelihood;
}
