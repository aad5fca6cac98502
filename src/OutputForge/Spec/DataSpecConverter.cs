using System.Text.Json;
using System.Text.Json.Serialization;

namespace OutputForge.Spec;

/// <summary>
/// Reads the study spec's "data" object, whose dataset entries are a file name (<c>"adsl": "adsl.xpt"</c>) or, for an
/// XPT file of several datasets, the file and the member to read (<c>"adsl": { "file": "library.xpt", "member":
/// "ADSL" }</c>): the file names go to <see cref="DataSpec.Datasets"/> and the members to <see cref="DataSpec.Members"/>,
/// so that everything else keeps seeing one file name per dataset. The schema has checked the shape before this runs.
/// </summary>
internal sealed class DataSpecConverter : JsonConverter<DataSpec>
{
    public override DataSpec Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        using var document = JsonDocument.ParseValue(ref reader);
        var root = document.RootElement;
        var datasets = new Dictionary<string, string>(StringComparer.Ordinal);
        var members = new Dictionary<string, string>(StringComparer.Ordinal);
        if (root.TryGetProperty("datasets", out var entries) && entries.ValueKind == JsonValueKind.Object)
        {
            foreach (var entry in entries.EnumerateObject())
            {
                if (entry.Value.ValueKind == JsonValueKind.Object)
                {
                    datasets[entry.Name] = entry.Value.GetProperty("file").GetString()!;
                    members[entry.Name] = entry.Value.GetProperty("member").GetString()!;
                }
                else
                {
                    datasets[entry.Name] = entry.Value.GetString()!;
                }
            }
        }
        return new DataSpec
        {
            Folder = root.TryGetProperty("folder", out var folder) ? folder.GetString() : null,
            Datasets = datasets,
            Members = members,
        };
    }

    public override void Write(Utf8JsonWriter writer, DataSpec value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        if (value.Folder is not null)
        {
            writer.WriteString("folder", value.Folder);
        }
        writer.WriteStartObject("datasets");
        foreach (var (name, file) in value.Datasets)
        {
            if (value.Members.TryGetValue(name, out var member))
            {
                writer.WriteStartObject(name);
                writer.WriteString("file", file);
                writer.WriteString("member", member);
                writer.WriteEndObject();
            }
            else
            {
                writer.WriteString(name, file);
            }
        }
        writer.WriteEndObject();
        writer.WriteEndObject();
    }
}
