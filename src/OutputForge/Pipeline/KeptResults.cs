using System.Text.Json;
using OutputForge.Results;

namespace OutputForge.Pipeline;

/// <summary>
/// The entries of an existing results.json that a run of only some tables keeps: each table's
/// entry and records, by table id, written back unchanged beside the tables produced anew.
/// </summary>
public sealed class KeptResults
{
    private KeptResults(Dictionary<string, JsonElement> tables, Dictionary<string, List<JsonElement>> records)
    {
        Tables = tables;
        Records = records;
    }

    public IReadOnlyDictionary<string, JsonElement> Tables { get; }
    public IReadOnlyDictionary<string, List<JsonElement>> Records { get; }

    /// <summary>The results of the run folder, or null when it has no results.json yet.</summary>
    public static KeptResults? Read(string runFolder)
    {
        var path = Path.Combine(runFolder, PackageRunner.ResultsFileName);
        if (!File.Exists(path))
        {
            return null;
        }
        JsonElement root;
        try
        {
            using var document = JsonDocument.Parse(File.ReadAllBytes(path));
            root = document.RootElement.Clone();
        }
        catch (JsonException e)
        {
            throw new RunException($"{path}: cannot read the existing results to keep the tables not rerun ({e.Message})");
        }
        // Tables kept from a results.json of another key scheme would mix two schemes in one file.
        if (!(root.TryGetProperty("keyScheme", out var scheme) && scheme.ValueKind == JsonValueKind.Number && scheme.TryGetInt32(out var n) && n == ResultKey.Scheme))
        {
            throw new RunException($"{path}: the existing results use another result key scheme than this version's ({ResultKey.Scheme}); " +
                                   "run every table (leave out --tables) so that results.json has one scheme");
        }
        var tables = new Dictionary<string, JsonElement>(StringComparer.Ordinal);
        var records = new Dictionary<string, List<JsonElement>>(StringComparer.Ordinal);
        foreach (var table in root.GetProperty("tables").EnumerateArray())
        {
            tables[table.GetProperty("id").GetString()!] = table;
        }
        foreach (var record in root.GetProperty("records").EnumerateArray())
        {
            var id = record.GetProperty("table").GetString()!;
            if (!records.TryGetValue(id, out var list))
            {
                records[id] = list = [];
            }
            list.Add(record);
        }
        return new KeptResults(tables, records);
    }
}
