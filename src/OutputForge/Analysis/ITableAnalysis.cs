using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>The analysis of one table kind (its part of <c>Kinds/ITableKind</c>): applies a table spec to the study data and returns its results.</summary>
public interface ITableAnalysis
{
    TableResult Analyze(StudySpec study, TableSpec table, StudyData data);

    /// <summary>
    /// The variables <see cref="Analyze"/> reads, by dataset, from the specs alone: every variable it looks up, so that a
    /// shell stand-in can provide them and a run can read only them (a test holds the two to each other).
    /// </summary>
    VariableReads Reads(StudySpec study, TableSpec table);
}
