using OutputForge.Analysis.Responders;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>The table kinds OutputForge knows, by their spec name.</summary>
public static class TableAnalyses
{
    private static readonly Dictionary<string, ITableAnalysis> ByKind = new ITableAnalysis[]
    {
        new ResponderAnalysis(),
        new Populations.PopulationsAnalysis(),
        new Disposition.DispositionAnalysis(),
        new Demographics.DemographicsAnalysis(),
        new AdverseEvents.AdverseEventAnalysis(),
        new Continuous.ContinuousAnalysis(),
        new TimeToEvent.TimeToEventAnalysis(),
        new Subgroups.SubgroupAnalysis(),
        new CategoricalByVisit.CategoricalByVisitAnalysis(),
    }.ToDictionary(a => a.Kind, StringComparer.Ordinal);

    public static IReadOnlyCollection<string> Kinds => ByKind.Keys;

    public static ITableAnalysis For(TableSpec table) =>
        ByKind.TryGetValue(table.Kind, out var analysis)
            ? analysis
            : throw table.Source.Error("/kind", $"unknown table kind '{table.Kind}'");
}
