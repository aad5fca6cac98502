using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// The CDISC pilot's Dataset-JSON files (converted from the same package by the CDISC Data Exchange Standards Team)
/// read to the same values as its XPT files and their CSV conversions, and the pilot validation specs give the same
/// results from CSV, XPT and Dataset-JSON.
/// </summary>
public sealed class PilotFormatsAgreementTests
{
    private static readonly string[] Shared = ["adsl", "adae", "adqscibc", "adtte"];

    [PilotFormatsFact]
    public void Dataset_json_xpt_and_csv_files_of_the_same_dataset_hold_the_same_values()
    {
        foreach (var name in Shared)
        {
            var xpt = XptDatasetReader.Read(name, PilotFormatsFactAttribute.PathOf($"xpt/{name}.xpt"));
            var json = DatasetJsonReader.Read(name, PilotFormatsFactAttribute.PathOf($"dataset-json/{name}.json"));
            var csv = CsvDatasetReader.Read(name, PilotFormatsFactAttribute.PathOf($"csv/{name}.csv"));
            AssertSameValues(xpt, json, compareLabels: true);
            AssertSameValues(xpt, csv, compareLabels: false);
        }
    }

    [PilotFormatsFact]
    public void The_datasets_only_in_dataset_json_read_with_their_declared_records()
    {
        foreach (var (name, rows) in new[] { ("adqsadas", 12463), ("adlbhy", 9954) })
        {
            var json = DatasetJsonReader.Read(name, PilotFormatsFactAttribute.PathOf($"dataset-json/{name}.json"));
            Assert.Equal(rows, json.RowCount);
            Assert.Equal(VariableKind.Number, json.Get("AVAL").Kind);
            Assert.Equal(VariableKind.Date, json.Get("ADT").Kind);
            Assert.NotNull(json.Get("PARAMCD").Label);
        }
    }

    /// <summary>
    /// Column by column: the same variables, missing in the same rows; numbers (and dates) equal as doubles where both
    /// files type the column so, otherwise the texts equal (a CSV column of site numbers is numeric, the XPT variable
    /// character; both read "701").
    /// </summary>
    internal static void AssertSameValues(Dataset expected, Dataset actual, bool compareLabels)
    {
        Assert.Equal(expected.RowCount, actual.RowCount);
        Assert.Equal(expected.Columns.Select(c => c.Name), actual.Columns.Select(c => c.Name));
        foreach (var column in expected.Columns)
        {
            var other = actual.Get(column.Name);
            var where = $"{expected.Name}.{column.Name} ({Path.GetFileName(actual.File)})";
            if (compareLabels)
            {
                Assert.True(column.Label == other.Label, $"{where}: label '{other.Label}', expected '{column.Label}'");
            }
            var numeric = column.Kind != VariableKind.Text && column.Kind == other.Kind;
            for (var row = 0; row < expected.RowCount; row++)
            {
                Assert.True(column.IsMissing(row) == other.IsMissing(row), $"{where} row {row + 1}: missing in one file only ('{column.GetText(row)}', '{other.GetText(row)}')");
                if (column.IsMissing(row)) continue;
                if (numeric)
                {
                    Assert.True(column.GetNumber(row) == other.GetNumber(row), $"{where} row {row + 1}: {column.GetNumber(row)} and {other.GetNumber(row)}");
                }
                else
                {
                    Assert.True(column.GetText(row) == other.GetText(row), $"{where} row {row + 1}: '{column.GetText(row)}' and '{other.GetText(row)}'");
                }
            }
        }
    }
}
