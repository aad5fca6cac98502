using System.Text.Json.Nodes;
using OutputForge.Analysis;

namespace OutputForge.Kinds;

/// <summary>
/// Writes the method catalogue into the table schema: a schema part says <c>"choices": "key"</c> where a value is one of
/// the names of <see cref="MethodCatalog"/>'s option <c>key</c>, and <c>"range": "key"</c> where it is a number of one of
/// its ranges; composition replaces the marker, in its place, by the enum (and default) or the type, bounds and default.
/// So the schema cannot drift from the names and defaults the program reads.
/// </summary>
internal static class CatalogueSchema
{
    public static void Expand(JsonNode? node)
    {
        switch (node)
        {
            case JsonObject obj:
                if (obj["choices"] is JsonValue choices && choices.TryGetValue<string>(out var key))
                {
                    var set = MethodCatalog.Find(key) ?? throw new InvalidOperationException($"the schema names an unknown option '{key}'");
                    var generated = new List<(string, JsonNode?)> { ("enum", new JsonArray(set.Names.Select(n => (JsonNode)JsonValue.Create(n)!).ToArray())) };
                    if (set.DefaultName is { } name)
                    {
                        generated.Add(("default", JsonValue.Create(name)));
                    }
                    Replace(obj, "choices", generated);
                }
                else if (obj["range"] is JsonValue rangeKey && rangeKey.TryGetValue<string>(out var rk))
                {
                    var range = MethodCatalog.FindRange(rk) ?? throw new InvalidOperationException($"the schema names an unknown range '{rk}'");
                    Replace(obj, "range",
                    [
                        ("type", JsonValue.Create("number")),
                        (range.MinimumIncluded ? "minimum" : "exclusiveMinimum", JsonValue.Create(range.Minimum)),
                        (range.MaximumIncluded ? "maximum" : "exclusiveMaximum", JsonValue.Create(range.Maximum)),
                        ("default", JsonValue.Create(range.Default)),
                    ]);
                }
                foreach (var (_, child) in obj.ToList())
                {
                    Expand(child);
                }
                break;
            case JsonArray array:
                foreach (var child in array.ToList())
                {
                    Expand(child);
                }
                break;
        }
    }

    private static void Replace(JsonObject obj, string marker, List<(string Key, JsonNode? Value)> generated)
    {
        var index = obj.IndexOf(marker);
        obj.Remove(marker);
        foreach (var (key, value) in generated)
        {
            if (obj.ContainsKey(key))
            {
                throw new InvalidOperationException($"a schema part gives '{key}' beside \"{marker}\": the catalogue defines it");
            }
            obj.Insert(index++, key, value);
        }
    }
}
