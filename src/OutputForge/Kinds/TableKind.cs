using System.Text.Json;
using System.Text.Json.Nodes;
using OutputForge.Analysis;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds;

/// <summary>
/// A table kind whose settings are read into <typeparamref name="TSettings"/>: one line of <see cref="TableKinds"/>.
/// The schema fragment is the embedded <c>&lt;name&gt;.schema.json</c> of the kind's folder.
/// </summary>
public sealed record TableKind<TSettings>(string Name, string SettingsKey, ITableAnalysis Analysis, IShellStandIn StandIn)
    : ITableKind where TSettings : class
{
    /// <summary>The settings of a table whose spec gives none; null (the default) where the schema requires them.</summary>
    public Func<TSettings>? Defaults { get; init; }

    public bool RunsFirst { get; init; }

    public Type SettingsType => typeof(TSettings);

    public string SchemaFragment => TableSchemaComposition.FragmentPrefix + Name + ".schema.json";

    public object? DefaultSettings() => Defaults?.Invoke();

    public object ReadSettings(JsonNode settings, JsonSerializerOptions options) =>
        settings.Deserialize<TSettings>(options) ?? throw new JsonException($"the \"{SettingsKey}\" settings are null");
}
