namespace OutputForge.Results;

/// <summary>
/// The population a table's numbers were computed on, as the spec gives it: the population's name in the study spec,
/// its condition on ADSL, and the table's subset condition where it has one. Every record of results.json carries it,
/// so a record read alone says which subjects it counts.
/// </summary>
public sealed record RecordPopulation(string Name, string Where, string? Subset = null);
