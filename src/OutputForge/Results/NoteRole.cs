namespace OutputForge.Results;

/// <summary>Where a note is printed: among the table's footnotes, or as a "Warning:" line (and in the run log and results.json).</summary>
public enum NoteRole
{
    /// <summary>A footnote explaining a method or a convention; lettered when a row or column refers to it.</summary>
    Footnote,
    /// <summary>Something the reader must know about the data or a computation (never hidden).</summary>
    Warning,
}
