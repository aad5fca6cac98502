using OutputForge.Choices;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;
using OutputForge.Stats;

namespace OutputForge.Spec;

/// <summary>One table of the package: what to count, in which population, with which statistics.</summary>
public sealed class TableSpec
{
    /// <summary>The table number as printed, e.g. "14.2.1".</summary>
    public required string Id { get; init; }
    public required List<string> Title { get; init; }
    public required string Population { get; init; }
    public required string Kind { get; init; }

    /// <summary>An extra condition on ADSL narrowing the population for this table only.</summary>
    public string? Subset { get; init; }

    public EndpointSpec? Endpoint { get; init; }
    public StatisticsSpec Statistics { get; init; } = new();
    public List<string> Footnotes { get; init; } = [];

    /// <summary>
    /// The keys the shared model leaves to the kinds: each kind's settings object under its key (e.g. "continuous"),
    /// shaped by the kind's schema fragment, and "$schema". Only the kind's own object is read, into
    /// <see cref="Settings{TSettings}"/>, by <see cref="Kinds.TableKinds.ReadSettings"/> when the spec loads.
    /// </summary>
    [JsonExtensionData]
    public JsonObject? KindKeys { get; set; }

    /// <summary>The settings object of the table's kind as its module read it; null when the spec has none.</summary>
    [JsonIgnore]
    public object? KindSettings { get; internal set; }

    /// <summary>
    /// The kind's typed settings, e.g. <c>table.Settings&lt;ContinuousSettings&gt;()</c>: as the spec gives them, or the
    /// kind's defaults where its settings are optional; a located spec error where they are required and absent.
    /// </summary>
    public TSettings Settings<TSettings>() where TSettings : class =>
        KindSettings as TSettings ?? Kinds.TableKinds.DefaultSettings<TSettings>(this);

    [JsonIgnore]
    public SpecSource Source { get; set; } = null!;
}

/// <summary>Which records of which dataset define the endpoint, and how a response is recognized.</summary>
public sealed class EndpointSpec
{
    public required string Dataset { get; init; }

    /// <summary>PARAMCD value selecting the parameter.</summary>
    public string? Parameter { get; init; }

    /// <summary>AVISIT value selecting the visit.</summary>
    public string? Visit { get; init; }

    /// <summary>Further record selection, e.g. "ANL01FL = 'Y'".</summary>
    public string? Where { get; init; }

    /// <summary>Condition that marks a record as a response, e.g. "AVALC = 'Y'".</summary>
    public string? Response { get; init; }

    /// <summary>How subjects without a record are handled: as non-responders, left out, or as observed.</summary>
    public MissingResponse Missing { get; init; } = MethodCatalog.MissingResponse.DefaultValue;

    /// <summary>Row-block label, e.g. "Itch responder at Week 12".</summary>
    public string? Label { get; init; }
}

public sealed class StatisticsSpec
{
    public double Level { get; init; } = MethodCatalog.ConfidenceLevel.Default;
    public ProportionCiMethod ProportionInterval { get; init; } = MethodCatalog.ProportionInterval.DefaultValue;
    public DifferenceCiMethod DifferenceInterval { get; init; } = MethodCatalog.DifferenceInterval.DefaultValue;

    /// <summary>Auto (chi-square, or Fisher's exact test when an expected count is below 5), chi-square, Yates, likelihood-ratio or Fisher.</summary>
    public TableTest Test { get; init; } = MethodCatalog.TableTest.DefaultValue;

    /// <summary>Decimals of percentages.</summary>
    public int PercentDecimals { get; init; } = 1;

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = MethodCatalog.PValueFloor.Default;
}
