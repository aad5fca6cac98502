using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace OutputForge.Kinds;

/// <summary>
/// Composes the table spec schema from its shared part (Spec/table.shared.schema.json: the keys every kind has) and
/// one fragment per kind of <see cref="TableKinds"/>: the kind's settings object becomes a property under its key,
/// its "whenKind" the "then" of an "if kind is this kind" rule, its "rules" further rules, and the "kind" enum lists
/// the registry's names in its order. Validation, its located messages and the schema shipped in specs/schema all
/// use the composed schema.
/// </summary>
public static class TableSchemaComposition
{
    /// <summary>The prefix of the embedded resource names of the kinds' fragments.</summary>
    public const string FragmentPrefix = "OutputForge.Kinds.";

    private const string SharedResource = "OutputForge.SchemaParts.table.shared.schema.json";

    private static readonly JsonSerializerOptions Indented = new()
    {
        WriteIndented = true,
        // The schema is read by people and editors: keep quotes and signs such as ' < > + as written.
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>The composed schema's text, as written to specs/schema/table.schema.json.</summary>
    public static string Text() => Compose().ToJsonString(Indented).ReplaceLineEndings("\n") + "\n";

    public static JsonObject Compose()
    {
        var schema = Load(SharedResource).AsObject();
        var properties = schema["properties"]!.AsObject();
        properties["kind"]!["enum"] = new JsonArray(TableKinds.Names.Select(n => (JsonNode)JsonValue.Create(n)).ToArray());
        var rules = new JsonArray();
        foreach (var kind in TableKinds.All)
        {
            var fragment = Load(kind.SchemaFragment).AsObject();
            properties[kind.SettingsKey] = fragment["settings"]!.DeepClone();
            if (fragment["whenKind"] is JsonObject { Count: > 0 } then)
            {
                rules.Add(new JsonObject
                {
                    ["if"] = new JsonObject { ["properties"] = new JsonObject { ["kind"] = new JsonObject { ["const"] = kind.Name } } },
                    ["then"] = then.DeepClone(),
                });
            }
            foreach (var rule in fragment["rules"]?.AsArray() ?? [])
            {
                rules.Add(rule!.DeepClone());
            }
        }
        schema["allOf"] = rules;
        CatalogueSchema.Expand(schema);
        return schema;
    }

    /// <summary>Whether the kind's fragment is embedded and has the parts a fragment must have.</summary>
    public static bool HasFragment(ITableKind kind)
    {
        using var stream = typeof(TableSchemaComposition).Assembly.GetManifestResourceStream(kind.SchemaFragment);
        return stream is not null && Load(kind.SchemaFragment) is JsonObject { } fragment
            && fragment["settings"] is JsonObject && fragment["whenKind"] is JsonObject && fragment["rules"] is JsonArray;
    }

    private static JsonNode Load(string resource)
    {
        using var stream = typeof(TableSchemaComposition).Assembly.GetManifestResourceStream(resource)
            ?? throw new InvalidOperationException($"the schema part {resource} is not embedded");
        return JsonNode.Parse(stream, documentOptions: new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip })!;
    }
}
