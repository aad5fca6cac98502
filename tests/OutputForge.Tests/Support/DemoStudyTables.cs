using System.Text.Json;

namespace OutputForge.Tests.Support;

/// <summary>What the demo study spec (specs/demo/study.json) lists, so tests follow it as table kinds are added.</summary>
public sealed record DemoStudyTables(IReadOnlyList<string> TableFiles, IReadOnlyList<string> TableIds, IReadOnlyList<string> DataFiles)
{
    public static DemoStudyTables Read()
    {
        var folder = Path.Combine(RepositoryRoot.Path, "specs", "demo");
        using var study = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "study.json")));
        var files = study.RootElement.GetProperty("tables").EnumerateArray().Select(t => t.GetString()!).ToList();
        var ids = files.Select(f =>
        {
            using var table = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, f)));
            return table.RootElement.GetProperty("id").GetString()!;
        }).ToList();
        var data = study.RootElement.GetProperty("data").GetProperty("datasets").EnumerateObject().Select(d => d.Value.GetString()!).ToList();
        return new DemoStudyTables(files, ids, data);
    }
}
