using System.Text.Json.Nodes;
using Json.Schema;

namespace OutputForge.Spec;

/// <summary>The JSON Schemas shipped in specs/schema, embedded in the assembly.</summary>
public static class SpecSchemas
{
    public const string Study = "study.schema.json";
    public const string Table = "table.schema.json";

    private static readonly Dictionary<string, (JsonSchema Schema, JsonNode Node)> Loaded = new();
    private static readonly object Gate = new();

    public static IReadOnlyList<string> Names => [Study, Table];

    /// <summary>The schema's text as shipped; the table schema as composed from its shared part and the kinds' fragments.</summary>
    public static string Text(string name)
    {
        if (name == Table)
        {
            return Kinds.TableSchemaComposition.Text();
        }
        using var stream = typeof(SpecSchemas).Assembly.GetManifestResourceStream("OutputForge.Schema." + name)
            ?? throw new InvalidOperationException($"schema {name} is not embedded");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    internal static (JsonSchema Schema, JsonNode Node) Get(string name)
    {
        lock (Gate)
        {
            if (!Loaded.TryGetValue(name, out var entry))
            {
                var text = Text(name);
                entry = (JsonSchema.FromText(text), JsonNode.Parse(text)!);
                Loaded[name] = entry;
            }
            return entry;
        }
    }
}
