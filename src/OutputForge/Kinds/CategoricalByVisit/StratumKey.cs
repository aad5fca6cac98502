using OutputForge.Analysis;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// The stratum of one subject: the values of the stratification variables, crossed. Displayed as
/// "STRAT1R = Europe, STRAT2R = Severe"; the whole-population stratum when there are no variables.
/// </summary>
internal sealed record StratumKey(string Text)
{
    public static readonly StratumKey All = new("all subjects");

    public static StratumKey Of(IReadOnlyList<RecordVariable> variables, IReadOnlyList<string> values) =>
        new(string.Join(", ", variables.Select((v, i) => $"{v.Name} = {values[i]}")));
}
