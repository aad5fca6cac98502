using System.Text;
using System.Text.Json;

namespace OutputForge.Spec;

/// <summary>
/// Where each value of a JSON text starts (line and column, 1-based), by JSON Pointer, so that
/// problems found after parsing can still point into the file.
/// </summary>
public sealed class JsonPositionMap
{
    private readonly Dictionary<string, (int Line, int Column)> _positions = new(StringComparer.Ordinal);

    private JsonPositionMap()
    {
    }

    /// <summary>Keys given twice in one object, at their second place (the JSON readers would silently keep the last).</summary>
    public IReadOnlyList<(string Pointer, int Line, int Column, int FirstLine)> DuplicateKeys => _duplicates;

    private readonly List<(string Pointer, int Line, int Column, int FirstLine)> _duplicates = [];

    public static JsonPositionMap Build(byte[] utf8)
    {
        var map = new JsonPositionMap();
        map.Walk(utf8, new List<string>(), out _);
        return map;
    }

    /// <summary>
    /// The JSON path of the place where a JSON text that does not parse fails (e.g. "$.a.b[3]" for nesting too deep), as
    /// far as the text reads; "$" when it fails at the start.
    /// </summary>
    public static string FailurePath(byte[] utf8)
    {
        var path = new List<string>();
        string? pendingName = null;
        try
        {
            new JsonPositionMap().Walk(utf8, path, out pendingName);
        }
        catch (JsonException)
        {
        }
        return ToJsonPath(Pointer(pendingName is null ? path : [.. path, pendingName]));
    }

    private void Walk(byte[] utf8, List<string> path, out string? pendingName)
    {
        var map = this;
        var lineStarts = LineStarts(utf8);
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions
        {
            CommentHandling = JsonCommentHandling.Skip,
            AllowTrailingCommas = true,
        });
        var arrayIndex = new Stack<int>();
        var inArray = new Stack<bool>();
        pendingName = null;
        while (reader.Read())
        {
            switch (reader.TokenType)
            {
                case JsonTokenType.PropertyName:
                    pendingName = reader.GetString();
                    map.Record(path, pendingName!, reader.TokenStartIndex, lineStarts, utf8, keyOnly: true);
                    break;
                case JsonTokenType.StartObject:
                case JsonTokenType.StartArray:
                    var segment = NextSegment(ref pendingName, inArray, arrayIndex);
                    if (segment is not null)
                    {
                        path.Add(segment);
                    }
                    map.Record(path, null, reader.TokenStartIndex, lineStarts, utf8, keyOnly: false);
                    inArray.Push(reader.TokenType == JsonTokenType.StartArray);
                    arrayIndex.Push(0);
                    break;
                case JsonTokenType.EndObject:
                case JsonTokenType.EndArray:
                    inArray.Pop();
                    arrayIndex.Pop();
                    if (path.Count > 0 && inArray.Count > 0)
                    {
                        path.RemoveAt(path.Count - 1);
                    }
                    break;
                default:
                    var valueSegment = NextSegment(ref pendingName, inArray, arrayIndex);
                    if (valueSegment is not null)
                    {
                        path.Add(valueSegment);
                    }
                    map.Record(path, null, reader.TokenStartIndex, lineStarts, utf8, keyOnly: false);
                    if (valueSegment is not null)
                    {
                        path.RemoveAt(path.Count - 1);
                    }
                    break;
            }
        }
    }

    private static string? NextSegment(ref string? pendingName, Stack<bool> inArray, Stack<int> arrayIndex)
    {
        if (inArray.Count == 0)
        {
            return null;
        }
        if (inArray.Peek())
        {
            var index = arrayIndex.Pop();
            arrayIndex.Push(index + 1);
            return index.ToString(System.Globalization.CultureInfo.InvariantCulture);
        }
        var name = pendingName;
        pendingName = null;
        return name;
    }

    private void Record(List<string> path, string? key, long offset, List<long> lineStarts, byte[] utf8, bool keyOnly)
    {
        var pointer = Pointer(path) + (key is null ? string.Empty : "/" + Escape(key));
        var position = Position(offset, lineStarts, utf8);
        if (keyOnly)
        {
            if (_positions.TryGetValue("key:" + pointer, out var first))
            {
                _duplicates.Add((pointer, position.Line, position.Column, first.Line));
                return;
            }
            _positions["key:" + pointer] = position;
        }
        else
        {
            _positions[pointer] = position;
        }
    }

    private static string Pointer(IEnumerable<string> path) => string.Concat(path.Select(p => "/" + Escape(p)));

    private static string Escape(string segment) => segment.Replace("~", "~0").Replace("/", "~1");

    private static List<long> LineStarts(byte[] utf8)
    {
        var starts = new List<long> { 0 };
        for (var i = 0; i < utf8.Length; i++)
        {
            if (utf8[i] == (byte)'\n')
            {
                starts.Add(i + 1);
            }
        }
        return starts;
    }

    private static (int Line, int Column) Position(long offset, List<long> lineStarts, byte[] utf8)
    {
        var index = lineStarts.BinarySearch(offset);
        if (index < 0)
        {
            index = ~index - 1;
        }
        var lineStart = (int)lineStarts[index];
        var column = Encoding.UTF8.GetCharCount(utf8, lineStart, (int)offset - lineStart) + 1;
        return (index + 1, column);
    }

    /// <summary>Position of the value at <paramref name="pointer"/>, or of its nearest existing parent.</summary>
    public (int Line, int Column)? Find(string pointer)
    {
        var current = pointer;
        while (true)
        {
            if (_positions.TryGetValue(current, out var position))
            {
                return position;
            }
            if (current.Length == 0)
            {
                return null;
            }
            current = current[..current.LastIndexOf('/')];
        }
    }

    /// <summary>Position of the key (property name) at <paramref name="pointer"/>, falling back to its value.</summary>
    public (int Line, int Column)? FindKey(string pointer) =>
        _positions.TryGetValue("key:" + pointer, out var position) ? position : Find(pointer);

    /// <summary>Turns a JSON Pointer ("/endpoint/where", "/title/0") into a JSON path ("$.endpoint.where", "$.title[0]").</summary>
    public static string ToJsonPath(string pointer)
    {
        var builder = new StringBuilder("$");
        foreach (var raw in pointer.Split('/', StringSplitOptions.RemoveEmptyEntries))
        {
            var segment = raw.Replace("~1", "/").Replace("~0", "~");
            if (segment.All(char.IsDigit))
            {
                builder.Append('[').Append(segment).Append(']');
            }
            else if (segment.All(c => char.IsLetterOrDigit(c) || c == '_'))
            {
                builder.Append('.').Append(segment);
            }
            else
            {
                builder.Append("['").Append(segment.Replace("'", "\\'")).Append("']");
            }
        }
        return builder.ToString();
    }
}
