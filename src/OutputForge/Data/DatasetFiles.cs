using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;

namespace OutputForge.Data;

/// <summary>
/// The data formats a study's dataset files may have, told apart by the file name's extension: CSV (.csv), the XPT
/// version 5 transport format (.xpt) and CDISC Dataset-JSON 1.1 (.json, or .ndjson for its newline-delimited form).
/// A study may mix them freely.
/// </summary>
public static class DatasetFiles
{
    public static readonly IReadOnlyList<string> Extensions = [".csv", ".xpt", ".json", ".ndjson"];

    public static bool IsCsv(string fileName) => fileName.EndsWith(".csv", StringComparison.OrdinalIgnoreCase);

    /// <summary>
    /// Reads any supported file; a CSV file with the CSV reader (in parts on all cores), the others streamed.
    /// <paramref name="member"/> names the member of an XPT file of several datasets (the study spec's "member").
    /// </summary>
    public static Dataset Read(string name, string path, DataReadOptions options, Action<string> warn, string? member = null)
    {
        var extension = Path.GetExtension(path).ToLowerInvariant();
        // A streamed file has no size limit, but it must be a regular file: a named pipe would make the run wait forever.
        if (extension != ".csv" && Files.RegularFile.NotRegular(path) is { } kind)
        {
            throw new DataException(path, null, null, $"the file is {kind}, not a regular file");
        }
        return extension switch
        {
            ".csv" => CsvDatasetReader.Read(name, path, options, warn),
            ".xpt" => XptDatasetReader.Read(name, path, options, warn, member),
            ".json" or ".ndjson" => DatasetJsonReader.Read(name, path, options, warn),
            _ => throw new DataException(path, null, null,
                $"unknown data format '{extension}' (expected a file ending in {string.Join(", ", Extensions)})"),
        };
    }
}
