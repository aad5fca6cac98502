using OutputForge.Data;

namespace OutputForge.Workflow.Compare;

/// <summary>
/// Reads a QC file: CSV (UTF-8, RFC 4180 quoting) with the columns table, row, column, statistic
/// and value, in any order and any letter case (docs/qc-workflow.md). Reuses the dataset reader,
/// so encoding and quoting faults are reported the same way, with file and line.
/// </summary>
public static class QcCsvReader
{
    public static readonly IReadOnlyList<string> Columns = ["table", "row", "column", "statistic", "value"];

    public static IReadOnlyList<QcLine> Read(string path)
    {
        var dataset = CsvDatasetReader.Read("qc", path);
        var missing = Columns.Where(c => dataset.Find(c) is null).ToList();
        if (missing.Count > 0)
        {
            throw new DataException(path, 1, null,
                $"the QC file has no column{(missing.Count == 1 ? "" : "s")} {string.Join(", ", missing)} (expected the header {string.Join(",", Columns)})");
        }
        var table = dataset.Get("table");
        var row = dataset.Get("row");
        var column = dataset.Get("column");
        var statistic = dataset.Get("statistic");
        var value = dataset.Get("value");
        var lines = new List<QcLine>(dataset.RowCount);
        for (var r = 0; r < dataset.RowCount; r++)
        {
            var line = dataset.LineOfRow[r];
            lines.Add(new QcLine(line, Required(table, r, path, line), Required(row, r, path, line), Required(column, r, path, line),
                Required(statistic, r, path, line), value.GetText(r)?.Trim() ?? string.Empty));
        }
        if (lines.Count == 0)
        {
            throw new DataException(path, null, null, "the QC file has a header but no numbers");
        }
        return lines;
    }

    private static string Required(DataColumn column, int row, string path, int line) =>
        column.GetText(row)?.Trim() is { Length: > 0 } text
            ? text
            : throw new DataException(path, line, column.Name, $"'{column.Name}' is empty; every QC number needs table, row, column and statistic");
}
