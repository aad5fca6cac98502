using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using OutputForge.Data;
using OutputForge.Data.Xpt;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// Every value of the public CDISC pilot XPT files, as the XPT reader reads it, equals what pandas reads
/// (pandas 1.5.3 read_sas(format="xport"), Debian bookworm python3-pandas): the generator script
/// Oracles/Xpt/generate_pilot_xpt_oracles.py wrote each variable's type, label, format, count and a digest of its
/// values (the digest rule is in the script) into Oracles/Xpt/pilot_xpt_oracles.json.
/// </summary>
public sealed class PilotXptOracleTests
{
    private static readonly DateOnly Epoch = new(1960, 1, 1);

    [PilotFormatsFact]
    public void Every_value_of_the_pilot_xpt_files_equals_what_pandas_reads()
    {
        using var oracle = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Tests", "Oracles", "Xpt", "pilot_xpt_oracles.json")));
        Assert.StartsWith("pandas 1.5.3", oracle.RootElement.GetProperty("source").GetString());
        var checkedVariables = 0;
        foreach (var file in oracle.RootElement.GetProperty("files").EnumerateObject())
        {
            var dataset = XptDatasetReader.Read(file.Name, PilotFormatsFactAttribute.PathOf($"xpt/{file.Name}.xpt"));
            Assert.Equal(file.Value.GetProperty("rows").GetInt32(), dataset.RowCount);
            var variables = file.Value.GetProperty("variables").EnumerateArray().ToList();
            Assert.Equal(variables.Select(v => v.GetProperty("name").GetString()), dataset.Columns.Select(c => c.Name));
            foreach (var expected in variables)
            {
                var column = dataset.Get(expected.GetProperty("name").GetString()!);
                var numeric = expected.GetProperty("numeric").GetBoolean();
                var lines = Enumerable.Range(0, dataset.RowCount).Select(row => Line(column, row, numeric)).ToList();
                var where = $"{file.Name}.{column.Name}";
                Assert.True(expected.GetProperty("label").GetString() == column.Label, $"{where}: label '{column.Label}'");
                Assert.True(expected.GetProperty("present").GetInt32() == lines.Count(l => l != "-"), $"{where}: count of present values");
                Assert.True(expected.GetProperty("digest").GetString() == Digest(lines), $"{where}: values differ from pandas");
                if (expected.GetProperty("format").GetString() == "DATE")
                {
                    Assert.Equal(VariableKind.Date, column.Kind);
                }
                checkedVariables++;
            }
        }
        Assert.True(checkedVariables > 100);
    }

    /// <summary>The generator's line for one value: "-" missing, "=" and the double's bits, "=" and the text.</summary>
    private static string Line(DataColumn column, int row, bool numeric)
    {
        if (column.IsMissing(row)) return "-";
        if (!numeric) return "=" + column.GetText(row);
        var value = column.Kind == VariableKind.Date ? column.GetNumber(row) - Epoch.DayNumber : column.GetNumber(row);
        return "=" + BitConverter.DoubleToUInt64Bits(value).ToString("x16", CultureInfo.InvariantCulture);
    }

    private static string Digest(IEnumerable<string> lines) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join("\n", lines))));
}
