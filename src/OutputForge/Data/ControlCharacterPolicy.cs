namespace OutputForge.Data;

/// <summary>
/// What to do with control characters in data values (U+0000-U+001F other than tab, line feed
/// and carriage return): XML, and so Word and Excel, cannot store them.
/// </summary>
public enum ControlCharacterPolicy
{
    /// <summary>Stop with an error naming the file, line and variable (the default).</summary>
    Refuse,
    /// <summary>Replace each by U+FFFD (a visible marker) and report a warning.</summary>
    Replace,
}
