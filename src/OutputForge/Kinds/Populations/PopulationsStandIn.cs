using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Populations;

/// <summary>
/// Summaries of analysis populations: each row's condition met by every subject where the values it
/// needs are not already fixed by the table's population, so that every row counts someone.
/// </summary>
public sealed class PopulationsStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        foreach (var row in records.Table.Settings<PopulationsSettings>().Rows)
        {
            var where = row.Population is { } name && records.Study.Populations.TryGetValue(name, out var population) ? population.Where : row.Where;
            if (where is not null)
            {
                CategoricalStandIn.Meet(records, where);
            }
        }
    }
}
