using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// Variable labels from XPT and Dataset-JSON files reach the layouts: a demographics block whose spec gives no label is
/// headed by the variable's label from the file (the CDISC pilot's ADSL), by its name for CSV, which has no labels.
/// </summary>
public sealed class FileLabelsTests
{
    [PilotFormatsFact]
    public void A_demographics_block_without_a_spec_label_is_headed_by_the_files_variable_label()
    {
        var xptLabel = XptDatasetReader.Read("adsl", PilotFormatsFactAttribute.PathOf("xpt/adsl.xpt")).Get("MMSETOT").Label;
        var jsonLabel = DatasetJsonReader.Read("adsl", PilotFormatsFactAttribute.PathOf("dataset-json/adsl.json")).Get("MMSETOT").Label;
        Assert.False(string.IsNullOrEmpty(xptLabel));
        Assert.False(string.IsNullOrEmpty(jsonLabel));
        using var temp = new TempFolder();
        foreach (var (extension, folder, expected) in new[] { ("xpt", "xpt", xptLabel!), ("json", "dataset-json", jsonLabel!), ("csv", "csv", "MMSETOT") })
        {
            var specs = Path.Combine(temp.Path, extension);
            CopySpecs(Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01"), specs, extension);
            var output = Path.Combine(temp.Path, "out-" + extension);
            var error = new StringWriter();
            var code = OutputForge.Cli.Program.Run(["run", "--spec", Path.Combine(specs, "study.json"), "--data", PilotFormatsFactAttribute.PathOf(folder),
                "--out", output, "--tables", "14-2.01", "--format", "txt", "--quiet", "--timestamp", "2026-12-01T09:00:00Z"], error);
            Assert.True(code == 0, error.ToString());
            var lines = File.ReadAllLines(Directory.GetFiles(output, "*.txt").Single());
            Assert.Contains(lines, l => l.StartsWith(expected + "  ", StringComparison.Ordinal));
            // The blocks whose spec gives a label keep it.
            Assert.Contains(lines, l => l.StartsWith("Age (y)  ", StringComparison.Ordinal));
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
            const string withLabel = "\"variable\": \"MMSETOT\", \"type\": \"continuous\", \"label\": \"MMSE\",";
            if (text.Contains("\"kind\": \"demographics\"", StringComparison.Ordinal))
            {
                Assert.Contains(withLabel, text);
                text = text.Replace(withLabel, "\"variable\": \"MMSETOT\", \"type\": \"continuous\",", StringComparison.Ordinal);
            }
            File.WriteAllText(target, text);
        }
    }
}
