using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Pipeline.Manifest;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Pipeline;

/// <summary>
/// Everything a run reads before its first table: the specs and templates, the data folder and its datasets with the
/// warnings of reading them, the inputs' digests, the tables selected and the run's facts (time, version, sources).
/// </summary>
internal sealed record PreparedRun(SpecPackage Package, TemplateSet Templates, string DataFolder, StudyData Data,
    IReadOnlyList<string> DataWarnings, RunInputs Inputs, IReadOnlyList<TableSpec> Selected, RunFacts Facts)
{
    public StudySpec Study => Package.Study;
}
