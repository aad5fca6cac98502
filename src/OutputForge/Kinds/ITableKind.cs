using System.Text.Json;
using System.Text.Json.Nodes;
using OutputForge.Analysis;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds;

/// <summary>
/// One table kind, everything the rest of the program needs of it: its name in specs, its typed settings and the
/// schema fragment that shapes them, its analysis, the stand-in records of its mock shells, and the facts the run's
/// work order uses. Each kind lives in one folder, <c>Kinds/&lt;Kind&gt;/</c>, and is listed once in
/// <see cref="TableKinds"/>.
/// </summary>
public interface ITableKind
{
    /// <summary>The spec's "kind" value, e.g. "categorical-by-visit".</summary>
    string Name { get; }

    /// <summary>The table spec key holding the kind's settings object, e.g. "categoricalByVisit".</summary>
    string SettingsKey { get; }

    /// <summary>The class the settings object is read into.</summary>
    Type SettingsType { get; }

    /// <summary>
    /// The embedded resource of the kind's schema fragment (<c>&lt;name&gt;.schema.json</c> in its folder): the schema of
    /// its settings object and what a table of this kind requires, composed into the table schema by
    /// <see cref="TableSchemaComposition"/>.
    /// </summary>
    string SchemaFragment { get; }

    ITableAnalysis Analysis { get; }

    IShellStandIn StandIn { get; }

    /// <summary>
    /// Whether the run takes its tables up before all others: a kind several times slower than the rest, so that the
    /// run does not end with one core on it while the others wait (<c>Pipeline/TableWorkOrder</c>).
    /// </summary>
    bool RunsFirst { get; }

    /// <summary>The settings a table of this kind has when its spec gives none; null where the schema requires them.</summary>
    object? DefaultSettings();

    /// <summary>Reads the kind's settings object (already checked against its schema fragment).</summary>
    object ReadSettings(JsonNode settings, JsonSerializerOptions options);
}
