using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>The demo study's specs written out alone (no data folder), and the shells of all its tables in Word and Excel.</summary>
public sealed class ShellsDemoFixture : IDisposable
{
    private readonly TempFolder _folder = new();

    public ShellsDemoFixture()
    {
        StudyFile = OutputForge.Demo.DemoSpecFiles.Write(_folder.Path);
        (ExitCode, _, Error) = WorkflowDemoFixture.Run(["shells", "--spec", StudyFile, "--out", Output, "--format", "docx,xlsx"]);
    }

    public string StudyFile { get; }
    public string Output => _folder.File("shells");
    public int ExitCode { get; }
    public string Error { get; }
    public string DataFolder => _folder.File("data");

    public string Word(string id) => Path.Combine(Output, $"shell-{id}.docx");
    public string Excel(string id) => Path.Combine(Output, $"shell-{id}.xlsx");

    /// <summary>The Word table's rows below the "(N=xx)" header row.</summary>
    public List<List<string>> WordBody(string id)
    {
        var rows = DocumentReader.WordTableRows(Word(id));
        var header = rows.FindIndex(r => r.Any(c => c.StartsWith("(N=", StringComparison.Ordinal)));
        Assert.True(header >= 0, $"table {id} has no (N=...) header row");
        return rows.Skip(header + 1).ToList();
    }

    public void Dispose() => _folder.Dispose();
}
