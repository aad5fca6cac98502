using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Spec;

namespace OutputForge.Kinds.AdverseEvents;

/// <summary>
/// The "adverse-events" kind: subjects with at least one event, overall, by system organ class and
/// by preferred term within it, n (%) of the population per arm; optionally the number of events,
/// a frequency threshold, a sort order, Fisher's exact p-values against the control, and a
/// by-severity variant (each subject counted once per row, at its maximum severity).
/// </summary>
public sealed class AdverseEventsSettings
{
    /// <summary>Dataset name of the study spec holding the events (OCCDS, one record per event).</summary>
    public string Dataset { get; init; } = "adae";

    /// <summary>Condition on the event records, e.g. "TRTEMFL = 'Y' and AESER = 'Y'".</summary>
    public string? Where { get; init; }

    public string SocVariable { get; init; } = "AEBODSYS";
    public string TermVariable { get; init; } = "AEDECOD";

    /// <summary>Label of the first row (subjects with at least one event).</summary>
    public string AnyLabel { get; init; } = "Subjects with at least one adverse event";

    /// <summary>Whether to show the number of events, "n (%) [E]".</summary>
    public bool Events { get; init; }

    /// <summary>Whether to show system organ class rows above their preferred terms.</summary>
    public bool SocRows { get; init; } = true;

    public AdverseEventSortSpec Sort { get; init; } = new();

    public AdverseEventThresholdSpec? Threshold { get; init; }

    /// <summary>None, or Fisher's exact test of each active arm against the control, per row.</summary>
    public SummaryTest Test { get; init; } = MethodCatalog.AdverseEventTest.DefaultValue;

    public AdverseEventSeveritySpec? Severity { get; init; }

    /// <summary>Whether to show a Total column; the study's treatment.total when absent.</summary>
    public bool? Total { get; init; }

    public PercentDisplaySpec Percent { get; init; } = new();

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = MethodCatalog.PValueFloor.Default;
}

public sealed class AdverseEventSortSpec
{
    /// <summary>Alphabetical, or by frequency (descending subject count in <see cref="Column"/>, ties alphabetical).</summary>
    public LevelSorting By { get; init; } = MethodCatalog.LevelSorting.DefaultValue;

    /// <summary>The arm (its value in the data) or "total" whose count orders the rows.</summary>
    public ArmChoice Column { get; init; } = ArmChoice.Total;
}

public sealed class AdverseEventThresholdSpec
{
    /// <summary>Keep a preferred term reported by at least this percentage of subjects...</summary>
    public required double Percent { get; init; }

    /// <summary>...in "any-arm", in the "total", or in the arm with this value.</summary>
    public ArmChoice In { get; init; } = ArmChoice.AnyArm;
}

public sealed class AdverseEventSeveritySpec
{
    public string Variable { get; init; } = "AESEV";

    /// <summary>Severity values from least to most severe.</summary>
    public required List<LevelSpec> Levels { get; init; }
}
