using System.Text;
using System.Text.Json;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// results.json as a snapshot: the run facts and each table entry and each record as one compact JSON line, so that
/// a field a record gains shows as a change of that record's line alone.
/// </summary>
public static class ResultsJsonProjection
{
    public static string Of(string file)
    {
        using var document = JsonDocument.Parse(File.ReadAllBytes(file));
        var text = new StringBuilder();
        foreach (var property in document.RootElement.EnumerateObject())
        {
            if (property.Value.ValueKind == JsonValueKind.Array)
            {
                text.Append(property.Name).Append(":\n");
                foreach (var item in property.Value.EnumerateArray())
                    text.Append(item.GetRawText().Contains('\n') ? Compact(item) : item.GetRawText()).Append('\n');
            }
            else
            {
                text.Append(property.Name).Append(": ").Append(property.Value.GetRawText()).Append('\n');
            }
        }
        return text.ToString();
    }

    private static string Compact(JsonElement element)
    {
        using var buffer = new MemoryStream();
        using (var writer = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = false, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
            element.WriteTo(writer);
        return Encoding.UTF8.GetString(buffer.ToArray());
    }
}
