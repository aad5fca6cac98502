using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>
/// A table's notes as printed: footnote letters given in order of first reference (the columns left to right, then
/// the rows top to bottom), the footnotes in the order the analysis lists them with their letters, the warnings, and
/// the labels of rows and columns with "{level}" written out and their letters appended. Text worded before Layout
/// (<see cref="TableResult.MethodNotes"/>, <see cref="TableResult.Warnings"/>) comes first, as it is.
/// </summary>
public sealed class TableNotes
{
    private readonly Dictionary<string, string> _letters = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _rowLabels = new(StringComparer.Ordinal);

    private TableNotes(TableResult table)
    {
        var footnotes = table.Notes.Where(n => n.Role == NoteRole.Footnote).ToDictionary(n => n.Id, StringComparer.Ordinal);
        var next = 'a';
        foreach (var id in table.Columns.SelectMany(c => c.NoteRefs).Concat(table.Rows.SelectMany(r => r.NoteRefs)))
        {
            if (!footnotes.ContainsKey(id))
                throw new InvalidOperationException($"table {table.TableId}: a row or column refers to footnote '{id}', which the table does not have");
            if (!_letters.ContainsKey(id))
                _letters[id] = $"[{next++}]";
        }
        foreach (var row in table.Rows)
            _rowLabels.TryAdd(row.Key, RowLabel(row));
        Footnotes = [.. table.MethodNotes, .. table.Notes.Where(n => n.Role == NoteRole.Footnote)
            .Select(n => (_letters.TryGetValue(n.Id, out var letter) ? letter + " " : string.Empty) + NoteWording.Word(n, RowLabelOf))];
        Warnings = [.. table.Warnings, .. table.Notes.Where(n => n.Role == NoteRole.Warning).Select(n => NoteWording.Word(n, RowLabelOf))];
    }

    public static TableNotes Of(TableResult table) => new(table);

    /// <summary>The footnotes explaining methods and conventions, in print order, lettered where referred to.</summary>
    public IReadOnlyList<string> Footnotes { get; }

    /// <summary>The warnings, worded, without the "Warning: " prefix.</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>The letters of the footnotes a row and a column refer to, as printed ("[a]"), row first.</summary>
    public IReadOnlyList<string> LettersOf(ResultRow row, ResultColumn column) =>
        row.NoteRefs.Concat(column.NoteRefs).Select(id => _letters[id]).Distinct(StringComparer.Ordinal).ToList();

    /// <summary>The letters of the footnotes of the headings a row stands under (outermost first) that the row and column do not already carry.</summary>
    public IReadOnlyList<string> HeadingLettersOf(IEnumerable<ResultRow> headings, ResultRow row, ResultColumn column)
    {
        var own = LettersOf(row, column);
        return headings.SelectMany(h => h.NoteRefs).Select(id => _letters[id]).Distinct(StringComparer.Ordinal).Except(own, StringComparer.Ordinal).ToList();
    }

    public string RowLabel(ResultRow row) => Label(row.Label, row.Level, row.NoteRefs);

    public string ColumnLabel(ResultColumn column) => Label(column.Label, column.Level, column.NoteRefs);

    private string RowLabelOf(string key) => _rowLabels.TryGetValue(key, out var label) ? label : key;

    private string Label(string label, double? level, IReadOnlyList<string> refs)
    {
        if (level is { } l)
            label = label.Replace("{level}", LevelText.Of(l), StringComparison.Ordinal);
        foreach (var id in refs)
            label += " " + _letters[id];
        return label;
    }
}
