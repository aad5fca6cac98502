using OutputForge.Tests.Support;

namespace OutputForge.Tests.EndToEnd;

/// <summary>Runs `outputforge demo` once, in-process, into a temp folder shared by the end-to-end tests.</summary>
public sealed class DemoRunFixture : IDisposable
{
    private readonly TempFolder _folder = new();

    public DemoRunFixture()
    {
        var log = new StringWriter();
        ExitCode = OutputForge.Cli.Program.Run(["demo", "--out", _folder.Path, "--format", "docx,xlsx,txt"], log);
        Log = log.ToString();
    }

    public int ExitCode { get; }
    public string Log { get; }
    public string Root => _folder.Path;
    public string Output(string file) => Path.Combine(_folder.Path, "output", file);
    public string Data(string file) => Path.Combine(_folder.Path, "data", file);

    public void Dispose() => _folder.Dispose();
}
