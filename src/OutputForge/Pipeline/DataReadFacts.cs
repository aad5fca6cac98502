using System.Globalization;
using OutputForge.Data;

namespace OutputForge.Pipeline;

/// <summary>
/// What a run read of its data, for --verbose: per dataset the file, its size (the whole file is read and hashed), the
/// rows, the columns kept of the file's columns and their names, and the datasets left unread.
/// </summary>
public static class DataReadFacts
{
    public static IEnumerable<string> Describe(StudyData data, bool projected)
    {
        foreach (var dataset in data.Datasets.OrderBy(d => d.Name == "adsl" ? 0 : 1).ThenBy(d => d.Name, StringComparer.Ordinal))
        {
            var size = File.Exists(dataset.File) ? new FileInfo(dataset.File).Length : 0;
            yield return string.Create(CultureInfo.InvariantCulture,
                $"data: {dataset.Name} ({Path.GetFileName(dataset.File)}, {size / 1e6:0.0} MB): {dataset.RowCount:N0} rows, {dataset.Columns.Count} of {dataset.VariableNames.Count} columns read{(projected && dataset.Columns.Count < dataset.VariableNames.Count ? ": " + string.Join(" ", dataset.Columns.Select(c => c.Name)) : "")}");
        }
        foreach (var name in data.Unread)
        {
            yield return $"data: {name} not read (no selected table uses it)";
        }
    }
}
