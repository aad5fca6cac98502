namespace OutputForge.Results;

/// <summary>
/// What a note is about, as data: the block or variable it concerns (<paramref name="What"/>, as displayed), a row
/// of the table by its key (<paramref name="Row"/>; Layout names it by its displayed label) and a column by its key, the
/// arm and the arm it is compared with, the visit, the parameter, and the stratum as the values of the stratification
/// variables. Every part is optional; Layout words the subject the same way for every kind.
/// </summary>
public sealed record NoteSubject(
    string? What = null,
    string? Arm = null,
    string? Control = null,
    string? Visit = null,
    string? Parameter = null,
    string? Row = null,
    string? Column = null,
    IReadOnlyList<string>? Stratum = null)
{
    public static readonly NoteSubject None = new();
}
