using OutputForge.Tests.Support;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// Snapshots of every output of the demo package, found in the output folder (so a new table
/// kind added to the demo is covered as soon as its snapshots are approved): the text preview
/// (the layout as normalized text), a projection of each .docx and each .xlsx, the combined ones
/// included, and results.json (<see cref="ResultsJsonProjection"/>). The demo runs at a fixed --timestamp so the snapshots are stable.
/// To approve changes: OUTPUTFORGE_APPROVE=1 dotnet test --filter DemoSnapshotTests, then review git diff.
/// </summary>
public sealed class DemoSnapshotTests : IClassFixture<DemoSnapshotTests.DemoPackage>
{
    public sealed class DemoPackage : IDisposable
    {
        private readonly TempFolder _folder = new();

        public DemoPackage()
        {
            var error = new StringWriter();
            int code = OutputForge.Cli.Program.Run(["demo", "--out", _folder.Path, "--format", "docx,xlsx,txt", "--combined",
                "--timestamp", "2026-12-01T09:00:00Z", "--quiet"], error);
            if (code != 0)
                throw new InvalidOperationException(error.ToString());
            Output = Path.Combine(_folder.Path, "output");
        }

        public string Output { get; }

        public void Dispose() => _folder.Dispose();
    }

    private readonly DemoPackage _demo;

    public DemoSnapshotTests(DemoPackage demo) => _demo = demo;

    public static TheoryData<string> Formats => new() { "txt", "docx", "xlsx" };

    [Fact]
    public void Results_json_matches_its_approved_snapshot()
    {
        var failure = SnapshotFile.Compare("results.json", ResultsJsonProjection.Of(Path.Combine(_demo.Output, "results.json")));
        Assert.True(failure is null, failure);
    }

    [Theory]
    [MemberData(nameof(Formats))]
    public void Every_output_matches_its_approved_snapshot(string format)
    {
        var files = Directory.GetFiles(_demo.Output, "*." + format).Order(StringComparer.Ordinal).ToList();
        Assert.NotEmpty(files);
        var failures = new List<string>();
        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var file in files)
        {
            string name = $"{Path.GetFileNameWithoutExtension(file)}.{format}";
            names.Add(name);
            string projection = format switch
            {
                "txt" => File.ReadAllText(file),
                "docx" => WordProjection.Of(file),
                _ => ExcelProjection.Of(file),
            };
            if (SnapshotFile.Compare(name, projection) is { } failure)
                failures.Add(failure);
        }
        // An approved snapshot without its output means a table left the demo: remove it deliberately.
        foreach (var approved in Directory.GetFiles(SnapshotFile.Folder, $"*.{format}.approved.txt"))
        {
            var name = Path.GetFileName(approved)[..^".approved.txt".Length];
            if (!names.Contains(name))
                failures.Add($"{name}: approved snapshot without an output in the demo package (delete it if the table was removed)");
        }
        Assert.True(failures.Count == 0, string.Join("\n\n", failures));
    }
}
