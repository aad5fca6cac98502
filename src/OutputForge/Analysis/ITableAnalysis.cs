using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>The analysis of one table kind (<see cref="Kinds.ITableKind"/>): applies a table spec to the study data and returns its results.</summary>
public interface ITableAnalysis
{
    TableResult Analyze(StudySpec study, TableSpec table, StudyData data);
}
