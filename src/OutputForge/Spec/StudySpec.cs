using System.Text.Json.Serialization;

namespace OutputForge.Spec;

/// <summary>The study-level spec: study facts, datasets, treatment arms, analysis populations and the table list.</summary>
public sealed class StudySpec
{
    public required StudyInfo Study { get; init; }
    public required DataSpec Data { get; init; }
    public required TreatmentSpec Treatment { get; init; }
    public required Dictionary<string, PopulationSpec> Populations { get; init; }
    public List<string> Tables { get; init; } = [];
    public PageSpec? Page { get; init; }

    /// <summary>What Fisher's exact test reports for a table beyond exact enumeration (absent: the defaults of <see cref="ExactTestSettings"/>).</summary>
    public ExactTestSettings? ExactTests { get; init; }

    [JsonIgnore]
    public SpecSource Source { get; set; } = null!;

    /// <summary>The folder the study file stands in; relative paths in it are taken from here.</summary>
    [JsonIgnore]
    public string Folder => Path.GetDirectoryName(Path.GetFullPath(Source.File))!;
}

public sealed class StudyInfo
{
    public required string Id { get; init; }
    public required string Title { get; init; }
    public string? Sponsor { get; init; }
    public string? Compound { get; init; }
}

[System.Text.Json.Serialization.JsonConverter(typeof(DataSpecConverter))]
public sealed class DataSpec
{
    /// <summary>Default data folder, relative to the study file; the command line's --data overrides it.</summary>
    public string? Folder { get; init; }

    /// <summary>Dataset name (as used in table specs) to file name within the data folder. "adsl" is required.</summary>
    public required Dictionary<string, string> Datasets { get; init; }

    /// <summary>
    /// The member to read, by dataset name, of an XPT file holding several datasets (an entry written
    /// <c>{ "file": "library.xpt", "member": "ADSL" }</c>); a dataset not listed is its file's only member.
    /// </summary>
    public IReadOnlyDictionary<string, string> Members { get; init; } = new Dictionary<string, string>();
}

public sealed class TreatmentSpec
{
    /// <summary>The ADSL variable holding the arm label, e.g. TRT01P.</summary>
    public required string Variable { get; init; }

    /// <summary>The numeric ADSL variable giving the arms' display order, e.g. TRT01PN.</summary>
    public string? Order { get; init; }

    /// <summary>The control arm's label as it appears in the data.</summary>
    public required string Control { get; init; }

    /// <summary>Whether tables get a Total column where the kind has one.</summary>
    public bool Total { get; init; }

    /// <summary>Optional display labels by data value (e.g. to shorten long arm names).</summary>
    public Dictionary<string, string>? Labels { get; init; }

    /// <summary>
    /// Optional list of the arms (values of the treatment variable) with their display order: used
    /// by mock shells, which have no data, and checked against the data by `check`.
    /// </summary>
    public List<ArmSpec>? Arms { get; init; }

    /// <summary>Optional groupings of arms printed as a spanning header over their columns (e.g. all doses of one compound).</summary>
    public List<ArmGroupSpec>? Groups { get; init; }
}

/// <summary>A spanning column header over the arms it names (values of the treatment variable), which must stand side by side.</summary>
public sealed class ArmGroupSpec
{
    public required string Label { get; init; }

    public required List<string> Arms { get; init; }
}

/// <summary>One treatment arm as the study spec lists it: its value of the treatment variable and its display order.</summary>
public sealed class ArmSpec
{
    public required string Value { get; init; }
    public double Order { get; init; }
}

public sealed class PopulationSpec
{
    public required string Label { get; init; }

    /// <summary>Condition on ADSL selecting the population's subjects.</summary>
    public required string Where { get; init; }

    /// <summary>Treatment variable to group by in this population (e.g. TRT01A for safety), if not the study's.</summary>
    public string? Treatment { get; init; }

    /// <summary>Order variable going with <see cref="Treatment"/>.</summary>
    public string? Order { get; init; }
}

public sealed class PageSpec
{
    public string? Paper { get; init; }
    public string? Orientation { get; init; }
    public string? Font { get; init; }
    public double? FontSize { get; init; }
}
