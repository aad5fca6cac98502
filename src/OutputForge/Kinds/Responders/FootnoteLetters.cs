using OutputForge.Spec;

namespace OutputForge.Kinds.Responders;

/// <summary>Hands out footnote letters in the order the rows that cite them appear ([a], [b], ...).</summary>
public sealed class FootnoteLetters(char first)
{
    private char _next = first;

    public string Next() => $"[{_next++}]";
}
