using System.Text.RegularExpressions;
using OutputForge.Data;
using OutputForge.Naming;

namespace OutputForge.Workflow.Compare;

/// <summary>
/// Finds the production number a QC line means. Table ids and statistics are matched ignoring
/// letter case (but "n" and "N" are told apart). A row (or column) is matched by its key exactly (keys are lower case,
/// docs/results.md "Keys"), then by its displayed label (ignoring case and runs of spaces), then by the label without
/// footnote markers ("95% CI [a]" -> "95% CI"); a label that then fits several rows is ambiguous and must be written as
/// a key. A value written as a key that names no row or column of the table (a mistyped key, or a key of an earlier
/// scheme such as "SEX/F") is an error of the QC file at its line, never matched loosely.
/// </summary>
public sealed partial class RecordLookup
{
    private readonly Dictionary<string, List<RunRecord>> _byTable;
    private readonly string _qcFile;

    public RecordLookup(IEnumerable<RunRecord> records, string qcFile)
    {
        _qcFile = qcFile;
        _byTable = records.GroupBy(r => r.Table, StringComparer.OrdinalIgnoreCase)
            .ToDictionary(g => g.Key, g => g.ToList(), StringComparer.OrdinalIgnoreCase);
    }

    /// <summary>The one record the line means, or null with the reason in <paramref name="problem"/>.</summary>
    public RunRecord? Find(QcLine line, out string? problem)
    {
        problem = null;
        if (!_byTable.TryGetValue(line.Table, out var records))
        {
            problem = $"no table '{line.Table}' in production{NearestName.Hint(line.Table, _byTable.Keys.ToList())}";
            return null;
        }
        var rows = Narrow(records, line.Row, r => r.Row, r => r.RowLabel, "row", out problem, out var ambiguousRow);
        if (rows is null)
        {
            if (!ambiguousRow)
            {
                RefuseUnknownKey(line, line.Row, records, r => r.Row, "row");
            }
            return null;
        }
        var cells = Narrow(rows, line.Column, r => r.Column, r => r.ColumnLabel, "column", out problem, out _);
        if (cells is null)
        {
            // The column may be one of the table's, only not one this row has a number in (e.g. a p-value row).
            var elsewhere = Narrow(records, line.Column, r => r.Column, r => r.ColumnLabel, "column", out var tableProblem, out var ambiguousColumn);
            if (elsewhere is null)
            {
                if (!ambiguousColumn)
                {
                    RefuseUnknownKey(line, line.Column, records, r => r.Column, "column");
                }
                problem = tableProblem;
            }
            else
            {
                var row = rows[0];
                problem = $"row '{row.Row}' of table {row.Table} has no number in column '{elsewhere[0].Column}' " +
                          $"(this row's columns: {string.Join(", ", rows.Select(r => r.Column).Distinct(StringComparer.Ordinal))})";
            }
            return null;
        }
        // "n" (subjects in the cell) and "N" (denominator) differ only in case: match exactly first.
        var match = cells.Where(r => r.Statistic.Equals(line.Statistic, StringComparison.Ordinal)).ToList();
        if (match.Count == 0)
        {
            match = cells.Where(r => r.Statistic.Equals(line.Statistic, StringComparison.OrdinalIgnoreCase)).ToList();
        }
        if (match.Count != 1)
        {
            var available = cells.Select(r => r.Statistic).Distinct().ToList();
            problem = $"no statistic '{line.Statistic}' in this cell (it has {string.Join(", ", available)})";
            return null;
        }
        return match[0];
    }

    private static List<RunRecord>? Narrow(List<RunRecord> records, string wanted, Func<RunRecord, string> key,
        Func<RunRecord, string> label, string what, out string? problem, out bool ambiguous)
    {
        problem = null;
        ambiguous = false;
        var byKey = records.Where(r => key(r).Equals(wanted, StringComparison.Ordinal)).ToList();
        if (byKey.Count > 0)
        {
            return byKey;
        }
        foreach (var normalize in new Func<string, string>[] { Normalize, WithoutMarkers })
        {
            var target = normalize(wanted);
            var byLabel = records.Where(r => normalize(label(r)) == target).ToList();
            var keys = byLabel.Select(key).Distinct(StringComparer.Ordinal).ToList();
            if (keys.Count == 1)
            {
                return byLabel;
            }
            if (keys.Count > 1)
            {
                ambiguous = true;
                problem = $"{what} '{wanted}' fits several {what}s ({string.Join(", ", keys)}); write the {what} key instead";
                return null;
            }
        }
        var known = records.Select(key).Distinct(StringComparer.Ordinal).ToList();
        problem = $"no {what} '{wanted}' in table {records[0].Table}{NearestName.Hint(wanted, known)} ({what} keys: {string.Join(", ", known)})";
        return null;
    }

    /// <summary>
    /// A row or column value that matched no key and no label, but was written as a key (<see cref="QcKeyReading"/>):
    /// the QC file is wrong at that line, so the comparison stops there with the nearest key of the table. An
    /// ambiguous label is left to the report.
    /// </summary>
    private void RefuseUnknownKey(QcLine line, string wanted, List<RunRecord> records, Func<RunRecord, string> key, string what)
    {
        var keys = records.Select(key).Distinct(StringComparer.Ordinal).ToList();
        if (QcKeyReading.MeantAsKey(wanted, keys, out var nearest))
        {
            throw new DataException(_qcFile, line.Line, null,
                $"{what} '{wanted}' is not a {what} key of table {records[0].Table}" +
                (nearest is null ? $" (its {what} keys: {string.Join(", ", keys.Take(12))}{(keys.Count > 12 ? ", ..." : "")})" : $"; the nearest key is '{nearest}'") +
                " (keys are written as docs/results.md, \"Keys\", says)");
        }
    }

    private static string Normalize(string text) => Spaces().Replace(text.Trim(), " ").ToLowerInvariant();

    private static string WithoutMarkers(string text) => Normalize(Markers().Replace(text, string.Empty));

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();

    /// <summary>Footnote markers such as "[a]" or "[1]" anywhere in a label.</summary>
    [GeneratedRegex(@"\s*\[[A-Za-z0-9]{1,2}\]")]
    private static partial Regex Markers();
}
