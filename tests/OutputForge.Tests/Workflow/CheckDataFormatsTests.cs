using OutputForge.Data;
using OutputForge.Data.Xpt;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// `outputforge check` reads XPT and Dataset-JSON datasets with their own readers, every column (not only what tables
/// use), and names a variable's label from the file beside it in its messages.
/// </summary>
public sealed class CheckDataFormatsTests
{
    [Theory]
    [InlineData("xpt")]
    [InlineData("json")]
    public void The_demo_package_in_another_format_has_no_errors(string format)
    {
        using var temp = new TempFolder();
        var (code, output, error) = WorkflowDemoFixture.Run(["demo", "--out", temp.Path, "--no-tables", "--data-format", format, "--quiet"]);
        Assert.True(code == 0, output + error);
        (code, output, error) = WorkflowDemoFixture.Run(["check", "--spec", Path.Combine(temp.Path, "specs", "demo"), "--data", Path.Combine(temp.Path, "data")]);
        Assert.True(code == 0, output + error);
        Assert.Contains("check: 0 errors", output);
    }

    [Fact]
    public void A_check_message_names_the_files_label_of_the_variable()
    {
        using var temp = new TempFolder();
        var (code, output, error) = WorkflowDemoFixture.Run(["demo", "--out", temp.Path, "--no-tables", "--data-format", "xpt", "--quiet"]);
        Assert.True(code == 0, output + error);
        // ADSL's AGE written as text (a value that is not a number), with a label: the numeric-variable convention fails.
        var data = Path.Combine(temp.Path, "data");
        var csv = Path.Combine(temp.Path, "adsl-source.csv");
        WriteAdslWithTextAge(data, csv);
        var adsl = CsvDatasetReader.Read("adsl", csv);
        XptDatasetWriter.Write(Labelled(adsl, "AGE", "Age at randomization"), Path.Combine(data, "adsl.xpt"), new DateTime(2026, 12, 1));
        (code, output, error) = WorkflowDemoFixture.Run(["check", "--spec", Path.Combine(temp.Path, "specs", "demo"), "--data", data]);
        Assert.NotEqual(0, code);
        Assert.Contains("but AGE (Age at randomization) is a numeric variable", output + error);
    }

    private static void WriteAdslWithTextAge(string data, string csv)
    {
        var rows = XptDatasetReader.Read("adsl", Path.Combine(data, "adsl.xpt"));
        var names = rows.Columns.Select(c => c.Name).ToList();
        using var writer = new StreamWriter(csv);
        writer.Write(string.Join(",", names) + "\n");
        for (var row = 0; row < rows.RowCount; row++)
        {
            writer.Write(string.Join(",", rows.Columns.Select(c => c.Name == "AGE" && row == 1 ? "unknown" : Quote(c.GetText(row)))) + "\n");
        }
    }

    private static string Quote(string? text) =>
        text is null ? "" : text.Contains(',') || text.Contains('"') ? "\"" + text.Replace("\"", "\"\"") + "\"" : text;

    private static Dataset Labelled(Dataset dataset, string variable, string label)
    {
        dataset.Get(variable).Label = label;
        return dataset;
    }
}
