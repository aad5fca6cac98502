using System.Collections.Concurrent;
using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The generalized CMH oracle files (Oracles/generalized_cmh*_oracles.json, each from its R script beside it):
/// their named sets, and the comparison of one statistic with R's value (df exactly, the statistic to 1e-9
/// and the p-value to 1e-8 relative, with an absolute floor for values near zero).
/// </summary>
internal static class GeneralizedCmhOracle
{
    private static readonly ConcurrentDictionary<string, JsonElement> Files = new(StringComparer.Ordinal);

    public static JsonElement Sets(string file) => Files.GetOrAdd(file, name => JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", name))).RootElement.GetProperty("sets"));

    public static IEnumerable<object[]> SetNames(string file) => Sets(file).EnumerateObject().Select(p => new object[] { p.Name });

    public static void Check(JsonElement expected, TestResult actual)
    {
        Assert.True(actual.IsEstimable, actual.NotEstimableReason);
        var statistic = expected.GetProperty("statistic").GetDouble();
        var p = expected.GetProperty("p").GetDouble();
        Assert.Equal(expected.GetProperty("df").GetInt32(), actual.DegreesOfFreedom);
        Assert.Equal(statistic, actual.Statistic!.Value, Math.Max(statistic * 1e-9, 1e-12));
        Assert.Equal(p, actual.PValue, Math.Max(p * 1e-8, 1e-14));
    }
}
