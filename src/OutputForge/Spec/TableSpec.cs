using System.Text.Json.Serialization;

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
    public PopulationsTableSpec? Populations { get; init; }
    public DispositionTableSpec? Disposition { get; init; }
    public DemographicsTableSpec? Demographics { get; init; }
    public AdverseEventsTableSpec? AdverseEvents { get; init; }
    public StatisticsSpec Statistics { get; init; } = new();
    public List<string> Footnotes { get; init; } = [];

    public ContinuousSettings? Continuous { get; init; }

    public TimeToEventSettings? TimeToEvent { get; init; }

    public ResponderSettings? Responders { get; init; }

    public SubgroupSettings? Subgroups { get; init; }

    public CategoricalByVisitSettings? CategoricalByVisit { get; init; }

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

    /// <summary>How subjects without a record are handled: "non-responder", "exclude" or "observed".</summary>
    public string Missing { get; init; } = "non-responder";

    /// <summary>Row-block label, e.g. "Itch responder at Week 12".</summary>
    public string? Label { get; init; }
}

public sealed class StatisticsSpec
{
    public double Level { get; init; } = 0.95;
    public string ProportionInterval { get; init; } = "wilson";
    public string DifferenceInterval { get; init; } = "newcombe";

    /// <summary>"auto" (chi-square, or Fisher's exact test when an expected count is below 5), "chi-square", "yates", "likelihood-ratio" or "fisher".</summary>
    public string Test { get; init; } = "auto";

    /// <summary>Decimals of percentages.</summary>
    public int PercentDecimals { get; init; } = 1;

    /// <summary>p-values below this are shown as "&lt;threshold".</summary>
    public double PValueFloor { get; init; } = 0.001;
}
