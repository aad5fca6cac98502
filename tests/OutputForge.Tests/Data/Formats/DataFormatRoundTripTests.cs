using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;
using OutputForge.Demo;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// The demo study written as XPT, Dataset-JSON and NDJSON reads back to the values of its CSV, and the demo package
/// produces the same results.json from all three formats.
/// </summary>
public sealed class DataFormatRoundTripTests
{
    private static readonly DateTime Created = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    [Fact]
    public void The_demo_datasets_read_back_to_the_same_values_from_every_format()
    {
        using var temp = new TempFolder();
        DemoStudyGenerator.WriteCsv(temp.Path, new DemoStudyOptions(120, 7));
        foreach (var csv in Directory.GetFiles(temp.Path, "*.csv"))
        {
            var name = Path.GetFileNameWithoutExtension(csv);
            var original = CsvDatasetReader.Read(name, csv);
            XptDatasetWriter.Write(original, temp.File(name + ".xpt"), Created);
            DatasetJsonWriter.Write(original, temp.File(name + ".json"), Created);
            DatasetJsonWriter.Write(original, temp.File(name + ".ndjson"), Created, ndjson: true);
            var xpt = XptDatasetReader.Read(name, temp.File(name + ".xpt"));
            var json = DatasetJsonReader.Read(name, temp.File(name + ".json"));
            var ndjson = DatasetJsonReader.Read(name, temp.File(name + ".ndjson"));
            PilotFormatsAgreementTests.AssertSameValues(original, xpt, compareLabels: false);
            PilotFormatsAgreementTests.AssertSameValues(original, json, compareLabels: false);
            PilotFormatsAgreementTests.AssertSameValues(original, ndjson, compareLabels: false);
            // Dataset-JSON keeps each value's text as written; the kinds agree with the CSV reader's typing.
            foreach (var column in original.Columns)
            {
                Assert.Equal(column.Kind, json.Get(column.Name).Kind);
                Assert.Equal(column.Kind, xpt.Get(column.Name).Kind);
                for (var row = 0; row < original.RowCount; row++)
                {
                    Assert.Equal(column.GetText(row), json.Get(column.Name).GetText(row));
                }
            }
            Assert.Equal(original.RowCount, ndjson.LineOfRow[^1] - 1);
            // The manifest's digest of the data read: the SHA-256 of the file's bytes.
            Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(temp.File(name + ".xpt")))), xpt.ContentSha256);
            Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(temp.File(name + ".json")))), json.ContentSha256);
        }
    }

    [Fact]
    public void The_demo_package_gives_identical_results_from_csv_xpt_and_dataset_json()
    {
        using var temp = new TempFolder();
        var results = new Dictionary<string, string>();
        foreach (var format in DemoDataFormat.All)
        {
            var root = temp.File(format);
            var error = new StringWriter();
            var code = OutputForge.Cli.Program.Run(["demo", "--out", root, "--data-format", format, "--subjects", "150",
                "--quiet", "--timestamp", "2026-12-01T09:00:00Z", "--format", "txt"], error);
            Assert.True(code == 0, error.ToString());
            Assert.Single(Directory.GetFiles(Path.Combine(root, "data"), "adsl.*"), f => f.EndsWith("." + format, StringComparison.Ordinal));
            results[format] = File.ReadAllText(Path.Combine(root, "output", "results.json"));
        }
        Assert.Contains("\"value\"", results["csv"]);
        Assert.Equal(results["csv"], results["xpt"]);
        Assert.Equal(results["csv"], results["json"]);
    }

    [Fact]
    public void Numbers_read_from_binary_keep_their_shortest_decimal_text()
    {
        // The text a transport-file number gets (docs/spec-reference.md, "Data formats"): the fewest decimals that read
        // back as the same double; the values are chosen so that the answer is known by hand.
        Assert.Equal((sbyte)0, TypedColumnBuilder.ShortestDecimals(42));
        Assert.Equal((sbyte)1, TypedColumnBuilder.ShortestDecimals(25.1));
        Assert.Equal((sbyte)2, TypedColumnBuilder.ShortestDecimals(-0.05));
        Assert.Equal((sbyte)12, TypedColumnBuilder.ShortestDecimals(0.794117647059));
        Assert.Null(TypedColumnBuilder.ShortestDecimals(1.0 / 3));
        Assert.Null(TypedColumnBuilder.ShortestDecimals(1e20));
    }

    [Fact]
    public void Special_missing_numbers_read_as_missing_with_their_letter_kept()
    {
        using var temp = new TempFolder();
        var original = CsvDatasetReader.Read("adsl", temp.Write("adsl.csv", "N,S\n1,a\n2,b\n3,c\n"));
        var path = temp.File("adsl.xpt");
        XptDatasetWriter.Write(original, path, Created);
        var bytes = File.ReadAllBytes(path);
        // Observations start after 8 header records, 4 records of 2 namestrs (280 bytes) and the observation header;
        // a row is N (8 bytes) then S (1 byte). Row 1's N becomes .A, row 2's ._ (the letter, then zero bytes).
        const int data = 13 * 80;
        bytes[data] = (byte)'A';
        Array.Clear(bytes, data + 1, 7);
        bytes[data + 9] = (byte)'_';
        Array.Clear(bytes, data + 10, 7);
        File.WriteAllBytes(path, bytes);
        var read = XptDatasetReader.Read("adsl", path).Get("N");
        Assert.True(read.IsMissing(0) && read.IsMissing(1));
        Assert.Equal('A', read.MissingLetter(0));
        Assert.Equal('_', read.MissingLetter(1));
        Assert.Null(read.MissingLetter(2));
        Assert.Equal(3, read.GetNumber(2));
    }
}
