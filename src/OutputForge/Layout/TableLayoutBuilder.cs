using System.Globalization;
using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>
/// Turns a <see cref="TableResult"/> into the display that every renderer draws: header rows with
/// "(N=xx)" under each column, formatted cells, footnotes (method notes, then warnings, then the
/// spec's own; worded and lettered by <see cref="TableNotes"/>), and the source line.
/// </summary>
public static class TableLayoutBuilder
{
    public const string Caution =
        "Results must be verified under your own validated processes, the SAP and applicable regulatory guidance.";

    /// <param name="display">Numbers, or placeholders of their precision for a mock shell (then no records and no warnings).</param>
    /// <param name="groups">Column groups printed as a spanning header row above the arm labels.</param>
    /// <param name="population">The population as the spec gives it, written on every record of results.json.</param>
    public static LaidOutTable Build(TableResult table, string studyLine, RunFacts run, PageSettings page,
        NumberDisplay display = NumberDisplay.Values, IReadOnlyList<ColumnGroup>? groups = null, RecordPopulation? population = null)
    {
        var shell = display == NumberDisplay.Placeholders;
        table = WithDistinctRowKeys(table);
        var notes = TableNotes.Of(table);
        var columns = new List<LayoutColumn> { new("label", CellAlignment.Left) };
        columns.AddRange(table.Columns.Select(c => new LayoutColumn(c.Key, CellAlignment.Center)));
        var headers = new List<HeaderRow>
        {
            new([new HeaderCell(string.Empty), .. table.Columns.Select(c => new HeaderCell(notes.ColumnLabel(c)))]),
            new([new HeaderCell(string.Empty), .. table.Columns.Select(c => new HeaderCell(
                c.SubjectCount is { } n ? (shell ? "(N=xx)" : string.Create(CultureInfo.InvariantCulture, $"(N={n})")) : string.Empty))]),
        };
        if (groups is { Count: > 0 } && ColumnGroupHeader.Build(table.Columns, groups) is { } groupRow)
        {
            headers.Insert(0, groupRow);
        }
        var records = new List<ResultRecord>();
        var rows = new List<BodyRow>();
        var columnLabel = table.Columns.ToDictionary(c => c.Key, notes.ColumnLabel, StringComparer.Ordinal);
        foreach (var column in table.Columns.Where(c => c.SubjectCount is not null && !shell))
        {
            records.Add(new ResultRecord(table.TableId, ResultKey.Header, column.Key, StatisticNames.Denominator, column.SubjectCount,
                column.SubjectCount!.Value.ToString(CultureInfo.InvariantCulture),
                string.Create(CultureInfo.InvariantCulture, $"(N={column.SubjectCount})"), column.Label, null, null) { Population = population });
        }
        // The headings above a row: the nearest row of each smaller indent since the last blank row.
        var headings = new List<ResultRow>();
        foreach (var row in table.Rows)
        {
            if (row.Kind == ResultRowKind.Blank)
            {
                headings.Clear();
            }
            else
            {
                headings.RemoveAll(h => h.Indent >= row.Indent);
            }
            var rowLabel = notes.RowLabel(row);
            var cells = new List<LayoutCell>();
            foreach (var column in table.Columns)
            {
                var cell = row.Cells.FirstOrDefault(c => c.Column == column.Key);
                cells.Add(cell is null ? LayoutCell.Empty : shell ? CellText.ComposePlaceholder(cell, table) : CellText.Compose(cell, table));
                if (cell is null || shell)
                {
                    continue;
                }
                foreach (var value in cell.Values)
                {
                    records.Add(new ResultRecord(table.TableId, row.Key, column.Key, value.Statistic, value.Value,
                        CellText.Format(value, table), rowLabel, columnLabel[column.Key], value.Method, value.NotEstimableReason)
                    {
                        Level = value.Level,
                        Sided = value.Sided,
                        Footnotes = notes.LettersOf(row, column),
                        HeadingFootnotes = notes.HeadingLettersOf(headings, row, column),
                        Population = population,
                    });
                }
            }
            var kind = row.Kind switch
            {
                ResultRowKind.Section => RowKind.Section,
                ResultRowKind.Blank => RowKind.Blank,
                _ => RowKind.Data,
            };
            rows.Add(new BodyRow(rowLabel, row.Indent, cells, kind));
            if (row.Kind != ResultRowKind.Blank)
            {
                headings.Add(row);
            }
        }
        rows = [.. NumberAlignment.Apply(rows)];
        var footnotes = new List<string>(notes.Footnotes);
        if (!shell)
        {
            footnotes.AddRange(notes.Warnings.Select(w => "Warning: " + w));
        }
        if (rows.Any(r => r.Cells.Any(c => c.Text == CellText.NotEstimable)))
        {
            footnotes.Add("NE = not estimable.");
        }
        footnotes.AddRange(table.Footnotes);
        var document = new TableDocument(table.TableId, table.Titles, table.Population, studyLine, columns, headers, rows,
            footnotes, shell ? ShellSourceLine(table, run) : SourceLine(table, run), page)
        {
            Figure = shell ? null : table.Figure,
        };
        return new LaidOutTable(document, records);
    }

    private static string ShellSourceLine(TableResult table, RunFacts run) =>
        $"Source: {table.Provenance.SpecFile.Replace('\\', '/')}; mock shell, no data; OutputForge {run.ToolVersion}. {Caution}";

    private static string SourceLine(TableResult table, RunFacts run)
    {
        var files = table.Provenance.Datasets
            .Select(d => run.DataFiles.TryGetValue(d, out var f) ? f : d)
            .Distinct(StringComparer.Ordinal);
        var time = run.RunTime.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);
        return $"Source: {table.Provenance.SpecFile.Replace('\\', '/')}; data: {string.Join(", ", files)}; run {time}; OutputForge {run.ToolVersion}. {Caution}";
    }

    /// <summary>
    /// Every row key names one row of the table, the header row of the column Ns ("header") included: rows whose keys a
    /// kind built equal (two levels that differ only in letter case or punctuation) are told apart by the scheme's
    /// tie-break, in table order (<see cref="ResultKey.Distinct"/>).
    /// </summary>
    private static TableResult WithDistinctRowKeys(TableResult table)
    {
        var keys = ResultKey.Distinct([ResultKey.Header, .. table.Rows.Select(r => r.Key)]);
        return keys.Skip(1).SequenceEqual(table.Rows.Select(r => r.Key), StringComparer.Ordinal)
            ? table
            : table with { Rows = table.Rows.Select((r, i) => r with { Key = keys[i + 1] }).ToList() };
    }
}
