using System.Globalization;
using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Values produced by Oracles/generate_efficacy_oracles.R (R 4.2.2 with survival 3.5.3; versions are
/// recorded inside the JSON file) and the invented data sets that script drew and wrote beside them.
/// </summary>
internal static class EfficacyOracles
{
    private static string Folder => System.IO.Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles");

    private static readonly Lazy<JsonDocument> Document = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(Folder, "efficacy_oracles.json"))));

    public static JsonElement Root => Document.Value.RootElement;

    /// <summary>Rows of a committed CSV oracle data file, as header-keyed text.</summary>
    public static List<Dictionary<string, string>> ReadCsv(string file) => ReadCsvFile(System.IO.Path.Combine(Folder, file));

    /// <summary>Simple comma-separated reading (the oracle and pilot files have no quoted commas in the fields used).</summary>
    public static List<Dictionary<string, string>> ReadCsvFile(string path)
    {
        var lines = File.ReadAllLines(path).Where(l => l.Length > 0).ToList();
        var header = SplitLine(lines[0]);
        return lines.Skip(1).Select(l =>
        {
            var fields = SplitLine(l);
            return header.Select((h, i) => (h, i)).ToDictionary(p => p.h, p => p.i < fields.Count ? fields[p.i] : "");
        }).ToList();
    }

    private static List<string> SplitLine(string line)
    {
        var fields = new List<string>();
        var current = new System.Text.StringBuilder();
        var quoted = false;
        foreach (var c in line)
        {
            if (c == '"') { quoted = !quoted; continue; }
            if (c == ',' && !quoted) { fields.Add(current.ToString()); current.Clear(); continue; }
            current.Append(c);
        }
        fields.Add(current.ToString());
        return fields;
    }

    public static double Number(string text) => double.Parse(text, CultureInfo.InvariantCulture);

    public static double? Get(JsonElement element, string name) =>
        element.GetProperty(name).ValueKind == JsonValueKind.Null ? null : element.GetProperty(name).GetDouble();

    /// <summary>Agreement to a relative tolerance (absolute for values near zero).</summary>
    public static void Close(double expected, double actual, double relative, string what)
    {
        var scale = Math.Max(Math.Abs(expected), 1e-300);
        Assert.True(Math.Abs(expected - actual) <= relative * Math.Max(scale, 1e-12),
            $"{what}: expected {expected:R}, got {actual:R} (relative difference {Math.Abs(expected - actual) / scale:E2})");
    }
}
