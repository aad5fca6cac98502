using OutputForge.Data;
using OutputForge.Kinds;
using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// The datasets and variables a run reads (<see cref="ColumnProjection"/>), from the specs alone: every variable the
/// selected tables' kinds declare (<see cref="Analysis.ITableAnalysis.Reads"/>: the population, subset, endpoint,
/// response and settings variables), the study's treatment variable and its order, and USUBJID of every dataset read,
/// by which the run links records to ADSL and checks them against it (<see cref="AdamConformance"/>). Nothing else of a
/// run looks into the data: layout, templates and the manifest use the results, and the file digests cover the whole
/// files as they are read. The ADaM flag convention is checked on the variables read; `check` reads every column.
/// </summary>
public static class RunColumns
{
    /// <summary>
    /// The projection of <paramref name="tables"/>; null (read everything) when a table's reads cannot be told from its
    /// spec, so that its analysis reports the spec's problem at its place, as it would without the projection.
    /// </summary>
    public static ColumnProjection? For(StudySpec study, IReadOnlyList<TableSpec> tables)
    {
        var byDataset = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        void Add(string dataset, string? variable)
        {
            if (variable is null) return;
            if (!byDataset.TryGetValue(dataset, out var set))
            {
                set = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { AdamConformance.SubjectVariable };
                byDataset[dataset] = set;
            }
            set.Add(variable);
        }
        Add(Analysis.VariableReads.SubjectLevel, study.Treatment.Variable);
        Add(Analysis.VariableReads.SubjectLevel, study.Treatment.Order);
        foreach (var table in tables)
        {
            Analysis.VariableReads reads;
            try
            {
                reads = TableKinds.For(table).Analysis.Reads(study, table);
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                return null;
            }
            foreach (var (dataset, variables) in reads.ByDataset)
            {
                foreach (var variable in variables)
                {
                    Add(dataset, variable);
                }
            }
        }
        return new ColumnProjection(byDataset.ToDictionary(d => d.Key, d => (IEnumerable<string>)d.Value));
    }
}
