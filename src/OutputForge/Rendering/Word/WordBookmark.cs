using System.Text;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Bookmark names for table headings: a letter, then letters, digits and underscores, at most 40
/// characters (ECMA-376 Part 1, 17.13.6.2; Word's own limit), e.g. "Table_14_2_1_1".
/// </summary>
public static class WordBookmark
{
    /// <param name="tableId">The table number.</param>
    /// <param name="ordinal">The table's position in a combined document, which keeps names unique there.</param>
    public static string ForTable(string tableId, int? ordinal = null)
    {
        var builder = new StringBuilder(ordinal is { } n ? $"Table{n:000}_" : "Table_");
        foreach (var c in tableId)
            builder.Append(char.IsAsciiLetterOrDigit(c) ? c : '_');
        return builder.Length > 40 ? builder.ToString(0, 40) : builder.ToString();
    }
}
