using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Disposition;

/// <summary>Disposition: each block's levels (see <see cref="CategoricalStandIn"/>) among the subjects its condition counts.</summary>
public sealed class DispositionStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        foreach (var block in records.Table.Settings<DispositionSettings>().Blocks)
        {
            CategoricalStandIn.Add(records, block.Variable, block.Levels, block.OrderBy, block.Where);
        }
    }
}
