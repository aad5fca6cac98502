namespace OutputForge.Workflow.Shells;

/// <summary>The table kinds that have mock shells, by their spec name: one line per kind.</summary>
public static class ShellStandIns
{
    private static readonly Dictionary<string, IShellStandIn> ByKind = new IShellStandIn[]
    {
        new ResponderStandIn(),
        new PopulationsStandIn(),
        new DispositionStandIn(),
        new DemographicsStandIn(),
        new AdverseEventStandIn(),
        new ContinuousStandIn(),
        new TimeToEventStandIn(),
        new SubgroupStandIn(),
        new CategoricalByVisitStandIn(),
    }.ToDictionary(s => s.Kind, StringComparer.Ordinal);

    public static IReadOnlyCollection<string> Kinds => ByKind.Keys;

    public static IShellStandIn? For(string kind) => ByKind.GetValueOrDefault(kind);
}
