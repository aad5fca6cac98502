using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using OutputForge.Data;

namespace OutputForge.Benchmarks;

/// <summary>
/// Reading a generated BDS-like CSV file (invented subjects and values, written to a temporary
/// folder before the runs) into a typed dataset: parsing, type inference and column building.
/// </summary>
[MemoryDiagnoser]
public class CsvReadingBenchmark
{
    private string _folder = "";
    private string _path = "";

    [Params(100_000)]
    public int Rows { get; set; }

    [GlobalSetup]
    public void WriteFile()
    {
        _folder = Directory.CreateTempSubdirectory("outputforge-bench-").FullName;
        _path = Path.Combine(_folder, "adeff.csv");
        var random = new Random(20261202);
        var text = new StringBuilder("STUDYID,USUBJID,TRT01P,TRT01PN,PARAMCD,PARAM,AVISIT,AVISITN,AVAL,BASE,CHG,ADT,ANL01FL\n");
        for (int i = 0; i < Rows; i++)
        {
            int subject = i / 10;
            int visit = i % 10;
            int arm = subject % 3;
            double baseline = Math.Round(5 + random.NextDouble() * 4, 1);
            double value = Math.Round(baseline - random.NextDouble() * 3, 1);
            text.Append(CultureInfo.InvariantCulture, $"XB-100,XB-100-{subject:D6},{(arm == 0 ? "Placebo" : arm == 1 ? "Low dose" : "High dose")},{arm},ITCH,\"Itch score, 0-10\",Week {visit},{visit},");
            text.Append(CultureInfo.InvariantCulture, $"{value},{baseline},{Math.Round(value - baseline, 1)},2025-{1 + visit % 12:D2}-15,Y\n");
        }
        File.WriteAllText(_path, text.ToString());
    }

    [GlobalCleanup]
    public void RemoveFile() => Directory.Delete(_folder, recursive: true);

    [Benchmark(Description = "CsvDatasetReader.Read, 13 columns")]
    public int Read() => CsvDatasetReader.Read("adeff", _path).RowCount;
}
