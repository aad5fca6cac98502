using System.Text;

namespace OutputForge.Common;

/// <summary>
/// The characters a table document cannot hold: those XML 1.0 forbids in text (U+0000-U+001F except tab, line feed
/// and carriage return; U+FFFE and U+FFFF; a UTF-16 surrogate without its pair) and the other Unicode noncharacters
/// (U+FDD0-U+FDEF and the last two code points of every plane, Unicode Standard section 23.7), which are reserved
/// for a program's internal use and never meant to be interchanged. Word and Excel files are XML, so the policy is
/// the same for spec text, data values and template output.
/// </summary>
public static class ControlCharacters
{
    public const char Marker = '\uFFFD';

    /// <summary>A forbidden UTF-16 code unit on its own (a surrogate is forbidden only without its pair: see <see cref="IndexIn"/>).</summary>
    public static bool IsForbidden(char c) =>
        (c < '\u0020' && c is not '\t' and not '\n' and not '\r') || c is >= '\uFDD0' and <= '\uFDEF' or '\uFFFE' or '\uFFFF';

    /// <summary>Whether a code point is a noncharacter of a supplementary plane (U+1FFFE, U+1FFFF, ..., U+10FFFF).</summary>
    private static bool IsSupplementaryNoncharacter(int codePoint) => (codePoint & 0xFFFE) == 0xFFFE;

    /// <summary>The index of the first forbidden character, or -1.</summary>
    public static int IndexIn(string value)
    {
        for (var i = 0; i < value.Length; i++)
        {
            var c = value[i];
            if (char.IsHighSurrogate(c) && i + 1 < value.Length && char.IsLowSurrogate(value[i + 1]))
            {
                if (IsSupplementaryNoncharacter(char.ConvertToUtf32(c, value[i + 1])))
                {
                    return i;
                }
                i++;
                continue;
            }
            if (IsForbidden(c) || char.IsSurrogate(c))
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>What the forbidden character at <paramref name="index"/> is, e.g. "the control character U+0001".</summary>
    public static string Describe(string value, int index)
    {
        var c = value[index];
        if (char.IsHighSurrogate(c) && index + 1 < value.Length && char.IsLowSurrogate(value[index + 1]))
        {
            return $"the noncharacter U+{char.ConvertToUtf32(c, value[index + 1]):X4}";
        }
        if (char.IsSurrogate(c))
        {
            return $"a lone UTF-16 surrogate U+{(int)c:X4} (half of a character)";
        }
        return c < '\u0020' ? $"the control character U+{(int)c:X4}" : $"the noncharacter U+{(int)c:X4}";
    }

    /// <summary>The value with each forbidden character (a whole pair for a supplementary noncharacter) shown as U+FFFD.</summary>
    public static string Replace(string value)
    {
        var text = new StringBuilder(value.Length);
        for (var i = 0; i < value.Length; i++)
        {
            var c = value[i];
            if (char.IsHighSurrogate(c) && i + 1 < value.Length && char.IsLowSurrogate(value[i + 1]))
            {
                var pair = IsSupplementaryNoncharacter(char.ConvertToUtf32(c, value[i + 1]));
                if (pair)
                {
                    text.Append(Marker);
                }
                else
                {
                    text.Append(c).Append(value[i + 1]);
                }
                i++;
                continue;
            }
            text.Append(IsForbidden(c) || char.IsSurrogate(c) ? Marker : c);
        }
        return text.ToString();
    }
}
