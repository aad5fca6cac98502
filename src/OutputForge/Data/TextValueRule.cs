using OutputForge.Common;

namespace OutputForge.Data;

/// <summary>
/// The rule every data reader (CSV, XPT, Dataset-JSON) applies to a text value before storing it, so that a value
/// means the same whatever the file's format. Trailing blanks are the padding of fixed-length text in transport
/// files, not part of the value (ADaM compares text without them): they are dropped, so "S-001 " is subject S-001 in
/// every key and text comparison, and a value of blanks only is missing; leading blanks are kept. What is left must
/// fit a table document (<see cref="DocumentText"/>): at most 32,767 characters, and none of the characters of
/// <see cref="ControlCharacters"/> (control codes, noncharacters, lone surrogates), which are refused or, with
/// <see cref="ControlCharacterPolicy.Replace"/>, each replaced by U+FFFD.
/// </summary>
internal static class TextValueRule
{
    /// <summary>The value without its trailing blanks (U+0020), or null when it holds nothing else (a missing value).</summary>
    public static string? Unpadded(string value)
    {
        if (!value.EndsWith(' '))
        {
            return value.Length == 0 ? null : value;
        }
        var text = value.TrimEnd(' ');
        return text.Length == 0 ? null : text;
    }

    /// <summary>
    /// The bytes without their trailing blanks (empty for a missing value): the blank is the byte 0x20 in UTF-8 and in
    /// the single-byte encodings of older transport files alike.
    /// </summary>
    public static ReadOnlySpan<byte> Unpadded(ReadOnlySpan<byte> text)
    {
        var end = text.LastIndexOfAnyExcept((byte)' ');
        return end < 0 ? [] : text[..(end + 1)];
    }

    /// <summary>
    /// Whether UTF-8 bytes may hold a character the rule forbids, so that the text must be looked at: control codes are
    /// single bytes below 0x20, and noncharacters start with a byte from 0xEF to 0xF4 (a surrogate is not valid UTF-8,
    /// which each reader refuses or decodes otherwise).
    /// </summary>
    public static bool MayHoldForbidden(ReadOnlySpan<byte> utf8) =>
        utf8.IndexOfAnyInRange((byte)0, (byte)0x1F) >= 0 || utf8.IndexOfAnyInRange((byte)0xEF, (byte)0xF4) >= 0;

    /// <summary>
    /// The value (already without its padding) as it is stored, or null when it cannot be: <paramref name="problem"/>
    /// then says why, for the reader to give with the file, row and variable. Forbidden characters are refused or
    /// replaced as <paramref name="policy"/> says; <paramref name="replaced"/> counts the values changed so (the reader
    /// warns once with the count). With <paramref name="mayHoldForbidden"/> false (the caller has seen the bytes hold
    /// none, <see cref="MayHoldForbidden"/>) only the length is checked.
    /// </summary>
    public static string? Checked(string value, ControlCharacterPolicy policy, ref int replaced, out string? problem, bool mayHoldForbidden = true)
    {
        problem = null;
        if (value.Length > DocumentText.MaxLength)
        {
            problem = DocumentText.TooLong(value.Length);
            return null;
        }
        var at = mayHoldForbidden ? ControlCharacters.IndexIn(value) : -1;
        if (at < 0)
        {
            return value;
        }
        if (policy == ControlCharacterPolicy.Refuse)
        {
            problem = $"the value holds {ControlCharacters.Describe(value, at)} at character {at + 1}, which Word and Excel cannot store; clean the data, or run with --control-characters replace";
            return null;
        }
        replaced++;
        return ControlCharacters.Replace(value);
    }
}
