using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

namespace OutputForge.Results;

/// <summary>
/// The one scheme of the row and column keys of results.json, QC files and run comparisons (docs/results.md, "Keys").
/// A key is one or more parts joined by "/", outer to inner ("sex/f", "week-4/baseline/mean-sd",
/// "soc-gastrointestinal-disorders/pt-nausea"). Each part is a name of the spec or the data (a variable, a level's
/// value, a statistic row, a visit, an arm's value) or one of the tool's fixed words, written by <see cref="Part"/>:
/// lower-case ASCII letters and digits in words joined by "-", a "." only as a decimal point between digits. No key
/// holds a comma, quote, space or line break, so a QC file never needs CSV quoting for one. Rows whose keys would be
/// equal are told apart in table order by "_2", "_3", ... (<see cref="Distinct"/>), a mark no part can hold.
/// </summary>
public static partial class ResultKey
{
    /// <summary>The number of this scheme, written to results.json as "keyScheme"; readers refuse any other.</summary>
    public const int Scheme = 2;

    public const string Total = "total";
    public const string Header = "header";
    public const string Missing = "missing";

    /// <summary>What an empty name (or one of marks only, such as "-") is written as.</summary>
    public const string Blank = "blank";

    /// <summary>Comparison and arithmetic signs that tell levels apart ("&lt;65" and "&gt;=65"), spelt as words.</summary>
    private static readonly Dictionary<string, string> SignWords = new(StringComparer.Ordinal)
    {
        ["<="] = "le", [">="] = "ge", ["≤"] = "le", ["≥"] = "ge", ["<"] = "lt", [">"] = "gt", ["="] = "eq",
        ["+"] = "plus", ["%"] = "pct", ["&"] = "and",
    };

    /// <summary>
    /// One name in key form. After Unicode compatibility decomposition (NFKD) accents are dropped ("é" -> "e");
    /// ASCII letters are lower-cased and kept with digits; the signs of <see cref="SignWords"/> become words
    /// ("&gt;=65" -> "ge-65"); a "." between two digits stays ("0.5"); any other letter or digit becomes the word
    /// "u" and its code point in lower-case hex ("µ" -> "u3bc"); every other character (space, punctuation, a
    /// control character) only separates words, and the words are joined by one "-". An empty result is "blank".
    /// </summary>
    public static string Part(string name)
    {
        var text = name.Normalize(NormalizationForm.FormKD);
        var key = new StringBuilder(text.Length);
        var wordEnded = false;
        void Word(string word)
        {
            if (key.Length > 0)
            {
                key.Append('-');
            }
            key.Append(word);
            wordEnded = true;
        }
        for (var i = 0; i < text.Length;)
        {
            var rune = Rune.GetRuneAt(text, i);
            var width = rune.Utf16SequenceLength;
            var c = text[i];
            if (rune.IsAscii && char.IsAsciiLetterOrDigit(c))
            {
                if (wordEnded && key.Length > 0)
                {
                    key.Append('-');
                }
                key.Append(char.ToLowerInvariant(c));
                wordEnded = false;
            }
            else if (c == '.' && !wordEnded && key.Length > 0 && char.IsAsciiDigit(key[^1]) && i + 1 < text.Length && char.IsAsciiDigit(text[i + 1]))
            {
                key.Append('.');
            }
            else if (i + 1 < text.Length && SignWords.TryGetValue(text.Substring(i, 2), out var pair))
            {
                Word(pair);
                width = 2;
            }
            else if (SignWords.TryGetValue(rune.ToString(), out var sign))
            {
                Word(sign);
            }
            else if (Rune.GetUnicodeCategory(rune) is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark)
            {
                // An accent left by the decomposition: "é" is "e" and a combining acute, and the key keeps the "e".
            }
            else if (Rune.IsLetterOrDigit(rune))
            {
                Word("u" + rune.Value.ToString("x", CultureInfo.InvariantCulture));
            }
            else
            {
                wordEnded = true;
            }
            i += width;
        }
        return key.Length == 0 ? Blank : key.ToString();
    }

    /// <summary>A key of the given names, each written by <see cref="Part"/>, joined outer to inner by "/".</summary>
    public static string Of(params string[] names) => string.Join('/', names.Select(Part));

    /// <summary>A key below <paramref name="key"/> (already a key): its parts, then the names written by <see cref="Part"/>.</summary>
    public static string Below(string key, params string[] names) => string.Join('/', names.Select(Part).Prepend(key));

    /// <summary>Whether <paramref name="key"/> is written as this scheme writes keys (the pattern of docs/results.md).</summary>
    public static bool IsKey(string key) => KeyPattern().IsMatch(key);

    /// <summary>
    /// The keys made unique in order: the first of equal keys keeps it, the later ones get "_2", "_3", ... in the
    /// order they come, so every key names one row, and a table whose keys are distinct keeps them as they are.
    /// </summary>
    public static IReadOnlyList<string> Distinct(IReadOnlyList<string> keys)
    {
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        var unique = new List<string>(keys.Count);
        foreach (var key in keys)
        {
            var count = seen.GetValueOrDefault(key) + 1;
            seen[key] = count;
            unique.Add(count == 1 ? key : $"{key}_{count.ToString(CultureInfo.InvariantCulture)}");
        }
        return unique;
    }

    /// <summary>
    /// Words of lower-case letters and digits (a "." only between digits) joined by "-" within a part and by "/"
    /// between parts, with an optional "_n" tie-break at the end.
    /// </summary>
    [GeneratedRegex(@"^[a-z0-9]+(?:(?<=[0-9])\.[0-9][a-z0-9]*)*(?:[-/][a-z0-9]+(?:(?<=[0-9])\.[0-9][a-z0-9]*)*)*(?:_(?:[2-9]|[1-9][0-9]+))?$", RegexOptions.CultureInvariant)]
    public static partial Regex KeyPattern();
}
