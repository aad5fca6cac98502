using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

/// <summary>The default demo study (450 subjects, seed 301), generated once for all structure tests.</summary>
public sealed class DemoStudyFiles : IDisposable
{
    public string Folder { get; }
    public IReadOnlyList<string> WrittenFiles { get; }
    public CsvTable Adsl { get; }
    public CsvTable Adeff { get; }
    public CsvTable Adae { get; }
    public CsvTable Adtte { get; }

    public DemoStudyFiles()
    {
        Folder = NewTempFolder();
        WrittenFiles = DemoStudyGenerator.WriteCsv(Folder);
        Adsl = CsvTable.Read(Path.Combine(Folder, "adsl.csv"));
        Adeff = CsvTable.Read(Path.Combine(Folder, "adeff.csv"));
        Adae = CsvTable.Read(Path.Combine(Folder, "adae.csv"));
        Adtte = CsvTable.Read(Path.Combine(Folder, "adtte.csv"));
    }

    public static string NewTempFolder() =>
        Path.Combine(Path.GetTempPath(), "outputforge-demo-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(Folder)) Directory.Delete(Folder, recursive: true);
    }
}
