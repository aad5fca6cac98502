using System.Text.Json;
using OutputForge.Data;
using OutputForge.Pipeline;
using OutputForge.Results;

namespace OutputForge.Workflow;

/// <summary>One number of results.json as read back (see docs/results.md).</summary>
public sealed record RunRecord(string Table, string Row, string Column, string Statistic, double? Value, string Formatted,
    string RowLabel, string ColumnLabel)
{
    /// <summary>"14.2.1.1 / responders / placebo / percent": how reports name a number.</summary>
    public string Address => $"{Table} / {Row} / {Column} / {Statistic}";
}

/// <summary>
/// The results.json of a run folder (or the file itself): the table ids in package order and
/// every record. Two records with the same table, row, column and statistic would make a key
/// ambiguous, so reading refuses them.
/// </summary>
public sealed class RunResults
{
    private RunResults(string file, string study, string runTime, IReadOnlyList<string> tables, IReadOnlyList<RunRecord> records)
    {
        File = file;
        Study = study;
        RunTime = runTime;
        Tables = tables;
        Records = records;
    }

    public string File { get; }
    public string Study { get; }
    public string RunTime { get; }
    public IReadOnlyList<string> Tables { get; }
    public IReadOnlyList<RunRecord> Records { get; }

    public static RunResults Read(string runFolderOrFile)
    {
        var path = Directory.Exists(runFolderOrFile) ? Path.Combine(runFolderOrFile, PackageRunner.ResultsFileName) : runFolderOrFile;
        if (!System.IO.File.Exists(path))
        {
            throw new DataException(path, null, null, $"no such file (give a run folder written by `outputforge run`, or its results.json)");
        }
        try
        {
            using var document = JsonDocument.Parse(System.IO.File.ReadAllBytes(path));
            var root = document.RootElement;
            RefuseRetiredKeys(path, root);
            var tables = root.GetProperty("tables").EnumerateArray().Select(t => t.GetProperty("id").GetString()!).ToList();
            var records = root.GetProperty("records").EnumerateArray().Select(ReadRecord).ToList();
            var duplicate = records.GroupBy(r => r.Address, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
            if (duplicate is not null)
            {
                throw new DataException(path, null, null, $"two numbers share the key {duplicate.Key} (labels '{duplicate.First().RowLabel}' / '{duplicate.First().ColumnLabel}'), so they cannot be told apart; give the arms values that differ in more than letter case, accents or punctuation");
            }
            return new RunResults(path, root.GetProperty("study").GetString() ?? string.Empty,
                root.GetProperty("runTime").GetString() ?? string.Empty, tables, records);
        }
        catch (Exception e) when (e is JsonException or KeyNotFoundException or InvalidOperationException)
        {
            throw new DataException(path, null, null, $"not a results.json written by OutputForge ({e.Message})");
        }
    }

    /// <summary>
    /// A results.json of an earlier key scheme (before "keyScheme" was written) names its rows otherwise ("SEX/F" for
    /// "sex/f"): matching its records by key would miss or mismatch numbers, so it is refused rather than read.
    /// </summary>
    private static void RefuseRetiredKeys(string path, JsonElement root)
    {
        var scheme = root.TryGetProperty("keyScheme", out var written) && written.ValueKind == JsonValueKind.Number && written.TryGetInt32(out var n) ? n : 1;
        if (scheme != ResultKey.Scheme)
        {
            throw new DataException(path, null, null,
                $"written with result key scheme {scheme}, this version reads scheme {ResultKey.Scheme} (docs/results.md, \"Keys\"); rerun that package with this version");
        }
    }

    private static RunRecord ReadRecord(JsonElement r) => new(
        r.GetProperty("table").GetString()!,
        r.GetProperty("row").GetString()!,
        r.GetProperty("column").GetString()!,
        r.GetProperty("statistic").GetString()!,
        r.GetProperty("value").ValueKind == JsonValueKind.Null ? null : r.GetProperty("value").GetDouble(),
        r.GetProperty("formatted").GetString() ?? string.Empty,
        r.GetProperty("rowLabel").GetString() ?? string.Empty,
        r.GetProperty("columnLabel").GetString() ?? string.Empty);
}
