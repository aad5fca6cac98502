using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>One table kind: applies a table spec to the study data and returns its results.</summary>
public interface ITableAnalysis
{
    /// <summary>The spec's "kind" value, e.g. "responders".</summary>
    string Kind { get; }

    TableResult Analyze(StudySpec study, TableSpec table, StudyData data);
}
