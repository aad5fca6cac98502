using System.Text.Json;
using System.Text.Json.Serialization;
using OutputForge.Data;
using OutputForge.Pipeline;

namespace OutputForge.Pipeline.Manifest;

/// <summary>Reads and writes manifest.json (camelCase, indented, fixed property order).</summary>
public static class ManifestJson
{
    public const string FileName = "manifest.json";

    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        WriteIndented = true,
        DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
        TypeInfoResolver = new System.Text.Json.Serialization.Metadata.DefaultJsonTypeInfoResolver(),
    };

    public static void Write(Stream output, RunManifest manifest) => JsonSerializer.Serialize(output, manifest, Options);

    /// <summary>The manifest of a run folder (or the file itself); a missing or unreadable one is a <see cref="DataException"/>.</summary>
    public static RunManifest Read(string runFolderOrFile)
    {
        var path = Directory.Exists(runFolderOrFile) ? Path.Combine(runFolderOrFile, FileName) : runFolderOrFile;
        if (!File.Exists(path))
        {
            throw new DataException(path, null, null, $"no {FileName} (is this a run folder written by `outputforge run`?)");
        }
        try
        {
            return JsonSerializer.Deserialize<RunManifest>(File.ReadAllBytes(path), Options)
                ?? throw new DataException(path, null, null, $"the manifest is empty");
        }
        catch (JsonException e)
        {
            throw new DataException(path, null, null, $"not a readable manifest ({e.Message})");
        }
    }
}
