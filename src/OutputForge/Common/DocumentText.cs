namespace OutputForge.Common;

/// <summary>
/// The one rule for text that reaches a table document, whatever its source (spec, data, template) and format: at most
/// <see cref="MaxLength"/> characters in one piece, and none of the characters of <see cref="ControlCharacters"/>.
/// Each source is checked where it is read, so the error names the spec path, data line or template; the laid-out
/// document is checked once more before any renderer draws it (text assembled from several pieces).
/// </summary>
public static class DocumentText
{
    /// <summary>
    /// The most characters in one piece of text: what one spreadsheet cell holds (32,767, the documented cell limit of
    /// the spreadsheet format's main application, common practice), kept in every format so that Word, text and Excel
    /// show the same document.
    /// </summary>
    public const int MaxLength = 32_767;

    public static string TooLong(int length) =>
        FormattableString.Invariant($"the text is {length:N0} characters long, more than the {MaxLength:N0} one table cell can hold (the same limit in every format)");

    /// <summary>What is wrong with <paramref name="text"/> for a document, or null when it can be shown as it is.</summary>
    public static string? Problem(string? text)
    {
        if (text is null)
        {
            return null;
        }
        if (text.Length > MaxLength)
        {
            return TooLong(text.Length);
        }
        var at = ControlCharacters.IndexIn(text);
        return at < 0 ? null : $"the text holds {ControlCharacters.Describe(text, at)} at character {at + 1}, which Word and Excel cannot store";
    }
}
