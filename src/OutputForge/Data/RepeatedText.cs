namespace OutputForge.Data;

/// <summary>
/// The last plain text value read in one column, with its bytes: a value that repeats the row above (the subject,
/// parameter, visit or flag of consecutive BDS records) is then the same string again, without decoding it. Only
/// values kept as read are remembered (not those whose control characters were replaced), so a repeat stands for
/// exactly what reading it anew would give.
/// </summary>
internal struct RepeatedText
{
    private byte[]? _bytes;
    private int _length;
    private string? _value;

    /// <summary>The remembered string when <paramref name="utf8"/> is the same bytes, else null.</summary>
    public readonly string? Matches(ReadOnlySpan<byte> utf8) =>
        _value is not null && utf8.SequenceEqual(_bytes.AsSpan(0, _length)) ? _value : null;

    public void Remember(ReadOnlySpan<byte> utf8, string value)
    {
        if (_bytes is null || _bytes.Length < utf8.Length)
        {
            _bytes = new byte[Math.Max(16, utf8.Length)];
        }
        utf8.CopyTo(_bytes);
        _length = utf8.Length;
        _value = value;
    }
}
