using System.Globalization;
using System.Text;

namespace OutputForge.Data.DatasetJson;

/// <summary>
/// The escapes of a JSON string (RFC 8259 section 7: \" \\ \/ \b \f \n \r \t and \uXXXX) resolved into UTF-16 text
/// exactly as written, a lone surrogate escape (\ud800 without its pair) included. System.Text.Json refuses to give
/// such a string, so a reader could otherwise only fail without saying where; kept, it is a forbidden character like
/// any other (<see cref="ControlCharacters"/>), refused at its row and column or replaced by U+FFFD.
/// </summary>
internal static class JsonEscapes
{
    /// <summary>The text of a string value's raw bytes (between the quotes), already checked to be valid JSON.</summary>
    public static string Resolve(ReadOnlySpan<byte> raw)
    {
        var text = new StringBuilder(raw.Length);
        var start = 0;
        for (var i = 0; i < raw.Length; i++)
        {
            if (raw[i] != (byte)'\\')
            {
                continue;
            }
            text.Append(Encoding.UTF8.GetString(raw[start..i]));
            var escape = (char)raw[i + 1];
            if (escape == 'u')
            {
                text.Append((char)int.Parse(raw.Slice(i + 2, 4), NumberStyles.AllowHexSpecifier, CultureInfo.InvariantCulture));
                i += 5;
            }
            else
            {
                text.Append(escape switch
                {
                    'b' => '\b',
                    'f' => '\f',
                    'n' => '\n',
                    'r' => '\r',
                    't' => '\t',
                    _ => escape,
                });
                i++;
            }
            start = i + 1;
        }
        return text.Append(Encoding.UTF8.GetString(raw[start..])).ToString();
    }
}
