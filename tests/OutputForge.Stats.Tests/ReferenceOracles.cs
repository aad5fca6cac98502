using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Values produced by Oracles/generate_phase1_oracles.py (scipy 1.10.1, statsmodels 0.13.5,
/// R 4.2.2; the exact versions are recorded inside the JSON file next to the values).
/// </summary>
internal static class ReferenceOracles
{
    private static readonly Lazy<JsonDocument> Phase1Document = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "phase1_oracles.json"))));

    public static JsonElement Phase1 => Phase1Document.Value.RootElement;

    public static IEnumerable<JsonElement> Section(string name) => Phase1.GetProperty(name).EnumerateArray();
}
