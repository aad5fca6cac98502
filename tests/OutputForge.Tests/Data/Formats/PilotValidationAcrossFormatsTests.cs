using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// The pilot validation specs (specs/validation/cdiscpilot01) give byte-identical results.json from the pilot's CSV,
/// XPT and Dataset-JSON files: the specs are copied with their dataset file names changed, and run on each folder.
/// </summary>
public sealed class PilotValidationAcrossFormatsTests
{
    [PilotFormatsFact]
    public void The_validation_specs_give_identical_results_from_csv_xpt_and_dataset_json()
    {
        using var temp = new TempFolder();
        foreach (var study in new[] { "study.json", "cibic-study.json" })
        {
            var results = new Dictionary<string, string>();
            foreach (var (extension, folder) in new[] { ("csv", "csv"), ("xpt", "xpt"), ("json", "dataset-json") })
            {
                var specs = Path.Combine(temp.Path, extension);
                CopySpecs(Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01"), specs, extension);
                var output = Path.Combine(temp.Path, $"out-{extension}-{study}");
                var error = new StringWriter();
                var code = OutputForge.Cli.Program.Run(["run", "--spec", Path.Combine(specs, study), "--data", PilotFormatsFactAttribute.PathOf(folder),
                    "--out", output, "--quiet", "--timestamp", "2026-12-01T09:00:00Z"], error);
                Assert.True(code == 0, error.ToString());
                results[extension] = File.ReadAllText(Path.Combine(output, "results.json"));
            }
            Assert.Contains("\"tables\"", results["csv"]);
            Assert.Equal(results["csv"], results["xpt"]);
            Assert.Equal(results["csv"], results["json"]);
        }
    }

    private static void CopySpecs(string from, string to, string extension)
    {
        foreach (var file in Directory.GetFiles(from, "*.json", SearchOption.AllDirectories))
        {
            var target = Path.Combine(to, Path.GetRelativePath(from, file));
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            var text = File.ReadAllText(file);
            if (text.Contains("\"datasets\"", StringComparison.Ordinal))
            {
                text = text.Replace(".csv\"", $".{extension}\"", StringComparison.Ordinal);
            }
            File.WriteAllText(target, text);
        }
    }
}
