namespace OutputForge.Results;

/// <summary>
/// A note of a table as data: its <see cref="NoteKind"/>, whether it is a footnote or a warning, what it is about
/// (<see cref="NoteSubject"/>) and the values its wording needs (numbers, method names, lists of names). The prose is
/// written in one place, Layout's <c>NoteWording</c>, so one change of wording reaches every kind. Rows and columns
/// refer to a footnote by its <see cref="Id"/>; Layout letters the footnotes in order of first reference.
/// </summary>
/// <param name="Id">Unique within the table; what <see cref="ResultRow.NoteRefs"/> and <see cref="ResultColumn.NoteRefs"/> name.</param>
public sealed record ResultNote(string Id, NoteKind Kind, NoteRole Role, NoteSubject Subject, IReadOnlyDictionary<string, object> Values)
{
    public static ResultNote Footnote(string id, NoteKind kind, params (string Name, object Value)[] values) =>
        new(id, kind, NoteRole.Footnote, NoteSubject.None, values.ToDictionary(v => v.Name, v => v.Value, StringComparer.Ordinal));

    public static ResultNote Warning(NoteKind kind, NoteSubject subject, params (string Name, object Value)[] values) =>
        new(string.Empty, kind, NoteRole.Warning, subject, values.ToDictionary(v => v.Name, v => v.Value, StringComparer.Ordinal));

    public string Text(string name) => Values.TryGetValue(name, out var value) && value is string text
        ? text
        : throw new InvalidOperationException($"note {Kind} has no text value '{name}'");

    public string? OptionalText(string name) => Values.TryGetValue(name, out var value) ? value as string : null;

    public double Number(string name) => Values.TryGetValue(name, out var value)
        ? value switch
        {
            int i => i,
            double d => d,
            _ => throw new InvalidOperationException($"note {Kind} value '{name}' is not a number"),
        }
        : throw new InvalidOperationException($"note {Kind} has no number '{name}'");

    public bool Flag(string name) => Values.TryGetValue(name, out var value) && value is true;

    public IReadOnlyList<T> List<T>(string name) => Values.TryGetValue(name, out var value) && value is IReadOnlyList<T> list
        ? list
        : [];
}
