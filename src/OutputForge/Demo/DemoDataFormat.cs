using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;

namespace OutputForge.Demo;

/// <summary>
/// The format of the demo study's data files (`demo --data-format`): CSV as generated, or the same datasets as XPT
/// version 5 transport files or CDISC Dataset-JSON 1.1, each converted from the CSV (read back with the CSV reader,
/// so the three hold the same values) and named in the study spec by the new extension.
/// </summary>
public static class DemoDataFormat
{
    public const string Csv = "csv";
    public const string Xpt = "xpt";
    public const string Json = "json";

    public static readonly IReadOnlyList<string> All = [Csv, Xpt, Json];

    /// <summary>The files' creation time in their headers: fixed, so the demo's bytes do not depend on the day.</summary>
    private static readonly DateTime Created = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    /// <summary>Converts every CSV file of <paramref name="dataFolder"/> and renames them in the study specs under <paramref name="specFolder"/>.</summary>
    public static void Convert(string dataFolder, string specFolder, string format)
    {
        if (format == Csv) return;
        if (!All.Contains(format)) throw new DemoStudyException($"unknown data format '{format}' (expected {string.Join(", ", All)})");
        var renamed = new List<(string From, string To)>();
        foreach (var csv in Directory.GetFiles(dataFolder, "*.csv").Order(StringComparer.Ordinal))
        {
            var name = Path.GetFileNameWithoutExtension(csv);
            var dataset = CsvDatasetReader.Read(name, csv);
            var target = Path.ChangeExtension(csv, format);
            if (format == Xpt) XptDatasetWriter.Write(dataset, target, Created);
            else DatasetJsonWriter.Write(dataset, target, Created);
            File.Delete(csv);
            renamed.Add(($"\"{name}.csv\"", $"\"{name}.{format}\""));
        }
        foreach (var spec in Directory.GetFiles(specFolder, "*.json", SearchOption.AllDirectories))
        {
            var text = File.ReadAllText(spec);
            if (!text.Contains("\"datasets\"", StringComparison.Ordinal)) continue;
            var changed = text;
            foreach (var (from, to) in renamed) changed = changed.Replace(from, to, StringComparison.Ordinal);
            if (changed != text) File.WriteAllText(spec, changed);
        }
    }
}
