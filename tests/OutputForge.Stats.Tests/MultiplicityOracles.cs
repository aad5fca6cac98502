using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// R 4.2.2 p.adjust values from Oracles/generate_multiplicity_oracles.R and mice 3.15.0 pool values from
/// Oracles/generate_rubin_oracles.R (versions recorded inside the JSON files).
/// </summary>
internal static class MultiplicityOracles
{
    private static readonly Lazy<JsonDocument> PAdjustDocument = new(() => JsonDocument.Parse(File.ReadAllText(
        System.IO.Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "multiplicity_oracles.json"))));

    private static readonly Lazy<JsonDocument> RubinDocument = new(() => JsonDocument.Parse(File.ReadAllText(
        System.IO.Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "rubin_oracles.json"))));

    public static IEnumerable<JsonElement> PAdjustCases => PAdjustDocument.Value.RootElement.GetProperty("cases").EnumerateArray();

    public static JsonElement Rubin => RubinDocument.Value.RootElement;

    public static double[] Numbers(JsonElement array) => array.EnumerateArray().Select(v => v.GetDouble()).ToArray();
}
