using OutputForge.Results;

namespace OutputForge.Analysis;

/// <summary>
/// A warning for every "NE" in a table's rows, naming the row (by key; Layout prints its label) and the column, with
/// the reason the value was not estimable. Rows that print the same label give one warning per column and reason.
/// </summary>
public static class NotEstimableNotes
{
    public static IEnumerable<ResultNote> Of(IEnumerable<ResultRow> rows)
    {
        var seen = new HashSet<(string, double?, string, string, string)>();
        foreach (var row in rows)
        {
            foreach (var cell in row.Cells)
            {
                foreach (var value in cell.Values.Where(v => v.NotEstimableReason is not null))
                {
                    if (seen.Add((row.Label, row.Level, string.Join(" ", row.NoteRefs), cell.Column, value.NotEstimableReason!)))
                    {
                        yield return ResultNote.Warning(NoteKind.NotEstimable, new NoteSubject(Row: row.Key, Column: cell.Column),
                            ("reason", value.NotEstimableReason!));
                    }
                }
            }
        }
    }
}
