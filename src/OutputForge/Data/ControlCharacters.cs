namespace OutputForge.Data;

/// <summary>The characters XML 1.0 forbids in text (U+0000-U+001F except tab, line feed, carriage return).</summary>
public static class ControlCharacters
{
    public const char Marker = '\uFFFD';

    public static bool IsForbidden(char c) => c < '\u0020' && c is not '\t' and not '\n' and not '\r';

    public static int IndexIn(string value)
    {
        for (var i = 0; i < value.Length; i++)
        {
            if (IsForbidden(value[i]))
            {
                return i;
            }
        }
        return -1;
    }

    public static string Replace(string value) =>
        string.Create(value.Length, value, (span, source) =>
        {
            for (var i = 0; i < source.Length; i++)
            {
                span[i] = IsForbidden(source[i]) ? Marker : source[i];
            }
        });
}
