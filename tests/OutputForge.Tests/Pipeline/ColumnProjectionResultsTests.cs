using OutputForge.Data;
using OutputForge.Pipeline;
using OutputForge.Rendering;
using OutputForge.Tests.Data.Formats;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Pipeline;

/// <summary>
/// A run reads only the datasets and variables its tables declare (<see cref="RunColumns"/>). A variable skipped that an
/// analysis needed would give wrong numbers, so every demo table (CSV, XPT and Dataset-JSON data) and every pilot
/// validation table is run alone with the projection and with every column read, and the results.json files must be
/// byte-identical; a skipped variable looked up is an error, never an empty column.
/// </summary>
public sealed class ColumnProjectionResultsTests
{
    [Theory]
    [InlineData("csv")]
    [InlineData("xpt")]
    [InlineData("json")]
    public void Every_demo_table_gives_the_same_results_with_and_without_the_projection(string format)
    {
        using var temp = new TempFolder();
        var error = new StringWriter();
        Assert.True(OutputForge.Cli.Program.Run(["demo", "--out", temp.Path, "--no-tables", "--data-format", format, "--quiet"], error) == 0, error.ToString());
        var study = Path.Combine(temp.Path, "specs", "demo", "study.json");
        AssertSameResults(study, Path.Combine(temp.Path, "data"), temp.Path, expectSkipped: true);
    }

    [PilotFormatsFact]
    public void Every_pilot_validation_table_gives_the_same_results_with_and_without_the_projection()
    {
        using var temp = new TempFolder();
        foreach (var study in new[] { "study.json", "cibic-study.json" })
        {
            AssertSameResults(Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01", study),
                PilotFormatsFactAttribute.PathOf("csv"), Path.Combine(temp.Path, study), expectSkipped: true);
        }
    }

    [Fact]
    public void A_skipped_variable_looked_up_is_an_error_not_an_empty_column()
    {
        using var temp = new TempFolder();
        var path = Path.Combine(temp.Path, "adsl.csv");
        File.WriteAllText(path, "USUBJID,AGE,SEX\nS1,30,F\nS2,41,M\n");
        var options = new DataReadOptions { Projection = new ColumnProjection(new Dictionary<string, IEnumerable<string>> { ["adsl"] = ["USUBJID", "AGE"] }) };
        foreach (var read in new Func<Dataset>[] { () => CsvDatasetReader.Read("adsl", path, options, _ => { }) })
        {
            var dataset = read();
            Assert.Equal(["USUBJID", "AGE"], dataset.Columns.Select(c => c.Name));
            Assert.Equal(["USUBJID", "AGE", "SEX"], dataset.VariableNames);
            Assert.Null(dataset.Find("RACE"));
            var problem = Assert.Throws<DataException>(() => dataset.Find("sex"));
            Assert.Contains("was not read", problem.Message);
        }
    }

    private static void AssertSameResults(string studyFile, string dataFolder, string work, bool expectSkipped)
    {
        var package = OutputForge.Spec.SpecLoader.Load(studyFile);
        var renderers = new[] { OutputFormats.Find("txt")! };
        var skippedAny = false;
        foreach (var table in package.Tables)
        {
            var results = new Dictionary<bool, string>();
            foreach (var everything in new[] { false, true })
            {
                var output = Path.Combine(work, $"out-{table.Id}-{everything}");
                var log = new CollectingRunLog();
                PackageRunner.Run(new RunRequest(studyFile, dataFolder, output, renderers)
                {
                    RunTime = new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero),
                    Tables = [table.Id],
                    ReadEveryColumn = everything,
                }, log);
                results[everything] = File.ReadAllText(Path.Combine(output, PackageRunner.ResultsFileName));
            }
            Assert.Contains(table.Id, results[true]);
            Assert.True(results[true] == results[false], $"table {table.Id}: results.json differs with the projection");
            var projection = RunColumns.For(package.Study, [table]);
            Assert.NotNull(projection);
            var projected = StudyData.Load(package.Study, dataFolder, new DataReadOptions { Projection = projection }, _ => { });
            skippedAny |= projected.Unread.Count > 0 || projected.Datasets.Any(d => d.SkippedVariables.Count > 0);
        }
        // The projection did leave something out, so the comparison above compared two different reads.
        Assert.Equal(expectSkipped, skippedAny);
    }
}
