using System.Text.Json;
using OutputForge.Kinds.AdverseEvents;
using OutputForge.Kinds.CategoricalByVisit;
using OutputForge.Kinds.Continuous;
using OutputForge.Kinds.Demographics;
using OutputForge.Kinds.Disposition;
using OutputForge.Kinds.Populations;
using OutputForge.Kinds.Responders;
using OutputForge.Kinds.Subgroups;
using OutputForge.Kinds.TimeToEvent;
using OutputForge.Spec;

namespace OutputForge.Kinds;

/// <summary>
/// The table kinds OutputForge knows: the only registry, one line per kind. Its order is the order of the table
/// schema's "kind" enum (and so of the values an error lists).
/// </summary>
public static class TableKinds
{
    public static readonly IReadOnlyList<ITableKind> All =
    [
        new TableKind<ResponderSettings>("responders", "responders", new ResponderAnalysis(), new ResponderStandIn()) { Defaults = () => new() },
        new TableKind<PopulationsSettings>("populations", "populations", new PopulationsAnalysis(), new PopulationsStandIn()),
        new TableKind<DispositionSettings>("disposition", "disposition", new DispositionAnalysis(), new DispositionStandIn()),
        new TableKind<DemographicsSettings>("demographics", "demographics", new DemographicsAnalysis(), new DemographicsStandIn()),
        new TableKind<AdverseEventsSettings>("adverse-events", "adverseEvents", new AdverseEventAnalysis(), new AdverseEventStandIn()),
        new TableKind<ContinuousSettings>("continuous", "continuous", new ContinuousAnalysis(), new ContinuousStandIn()),
        new TableKind<TimeToEventSettings>("time-to-event", "timeToEvent", new TimeToEventAnalysis(), new TimeToEventStandIn()) { Defaults = () => new() },
        new TableKind<SubgroupSettings>("subgroups", "subgroups", new SubgroupAnalysis(), new SubgroupStandIn()) { RunsFirst = true },
        new TableKind<CategoricalByVisitSettings>("categorical-by-visit", "categoricalByVisit", new CategoricalByVisitAnalysis(), new CategoricalByVisitStandIn()),
    ];

    private static readonly Dictionary<string, ITableKind> ByName = All.ToDictionary(k => k.Name, StringComparer.Ordinal);

    private static readonly Dictionary<Type, ITableKind> BySettingsType = All.ToDictionary(k => k.SettingsType);

    public static IReadOnlyList<string> Names { get; } = All.Select(k => k.Name).ToList();

    /// <summary>The kind of a spec name, or null for a name no kind has.</summary>
    public static ITableKind? Find(string name) => ByName.GetValueOrDefault(name);

    /// <summary>The table's kind; a located spec error for a name no kind has (which the schema's enum already refuses).</summary>
    public static ITableKind For(TableSpec table) =>
        Find(table.Kind) ?? throw table.Source.Error("/kind", $"unknown table kind '{table.Kind}'");

    /// <summary>Reads the settings object of the table's own kind, when the spec gives one, into <see cref="TableSpec.KindSettings"/>.</summary>
    internal static void ReadSettings(TableSpec table, JsonSerializerOptions options)
    {
        if (Find(table.Kind) is { } kind && table.KindKeys?[kind.SettingsKey] is { } settings)
        {
            try
            {
                table.KindSettings = kind.ReadSettings(settings, options);
            }
            catch (JsonException e)
            {
                // The schema fragment refuses what the settings class cannot read; this guards a class that asks more.
                // The reader's path ("$.scores") is relative to the settings object.
                var inside = (e.Path ?? "$").TrimStart('$').Replace("[", ".").Replace("]", string.Empty).Replace('.', '/');
                throw table.Source.Error($"/{kind.SettingsKey}{inside}", e.Message);
            }
        }
    }

    /// <summary>The settings of a table whose spec gives none: the kind's defaults, or the located error that they are required.</summary>
    internal static TSettings DefaultSettings<TSettings>(TableSpec table) where TSettings : class
    {
        var kind = BySettingsType.GetValueOrDefault(typeof(TSettings))
            ?? throw new InvalidOperationException($"no table kind has the settings {typeof(TSettings).Name}");
        return kind.DefaultSettings() as TSettings
            ?? throw table.Source.Error("/kind", $"the {kind.Name} kind needs a \"{kind.SettingsKey}\" settings object");
    }
}
