using OutputForge.Data;
using OutputForge.Demo;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Kinds;

/// <summary>The demo specs of the repository (specs/demo) with the demo study's data, generated once.</summary>
public sealed class DemoStudyData : IDisposable
{
    private readonly TempFolder _folder = new();

    public DemoStudyData()
    {
        DemoStudyGenerator.WriteCsv(_folder.Path);
        Package = SpecLoader.Load(Path.Combine(RepositoryRoot.Path, "specs", "demo"));
        Data = StudyData.Load(Package.Study, _folder.Path);
    }

    public SpecPackage Package { get; }

    public StudyData Data { get; }

    public void Dispose() => _folder.Dispose();
}
