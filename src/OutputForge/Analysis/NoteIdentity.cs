using OutputForge.Results;

namespace OutputForge.Analysis;

/// <summary>
/// What makes two notes the same note (kind, role, subject and values, lists compared by their items), for a table
/// that says a remark arising in several places once.
/// </summary>
public static class NoteIdentity
{
    public static string Of(ResultNote note) =>
        string.Join("\u001f", new[] { note.Kind.ToString(), note.Role.ToString(), Subject(note.Subject) }
            .Concat(note.Values.OrderBy(v => v.Key, StringComparer.Ordinal).Select(v => v.Key + "=" + Value(v.Value))));

    private static string Subject(NoteSubject s) =>
        string.Join("\u001e", s.What, s.Arm, s.Control, s.Visit, s.Parameter, s.Row, s.Column, string.Join("\u001d", s.Stratum ?? []));

    private static string Value(object value) => value switch
    {
        System.Collections.IEnumerable items and not string => string.Join("\u001d", items.Cast<object>().Select(Value)),
        IFormattable number => number.ToString(null, System.Globalization.CultureInfo.InvariantCulture),
        _ => value.ToString() ?? string.Empty,
    };
}
