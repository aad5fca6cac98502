using System.Globalization;
using System.Text;
using System.Text.Json;
using OutputForge.Expressions;
using OutputForge.Common;

namespace OutputForge.Data.DatasetJson;

/// <summary>
/// Reads one dataset from a CDISC Dataset-JSON 1.1 file, streaming with <see cref="Utf8JsonReader"/> over blocks of
/// the file (never the whole file, never a document tree). The JSON form is one object whose <c>columns</c> (which
/// must come before <c>rows</c>) describe the variables and whose <c>rows</c> are arrays of values in column order;
/// the NDJSON form (.ndjson) is that object without <c>rows</c> on the first line, then one row array per line.
/// <c>records</c>, where given, must equal the number of rows. Values become columns as the CSV reader gives them
/// (<see cref="TypedColumnBuilder"/>): integer, float, double and decimal columns are numbers keeping their text as
/// written (a decimal's "1.50" stays "1.50"); date columns are dates (a column holding partial dates is text);
/// string, datetime, time, URI and boolean ("true"/"false") columns are text; null and "" are missing.
/// Every problem is a <see cref="DataException"/> naming the file and the row.
/// </summary>
public static partial class DatasetJsonReader
{
    private const int BlockBytes = 1 << 20;

    public static Dataset Read(string name, string path) => Read(name, path, DataReadOptions.Default, _ => { });

    public static Dataset Read(string name, string path, DataReadOptions options, Action<string> warn)
    {
        var ndjson = path.EndsWith(".ndjson", StringComparison.OrdinalIgnoreCase);
        var size = new FileInfo(path).Length;
        var digest = StreamedFileDigest.Start(path);
        var keep = options.KeepOf(name);
        var parser = (!ndjson && Environment.ProcessorCount > 1 && size >= 2L * DatasetJsonRowParts.PartBytes
            ? DatasetJsonRowParts.TryRead(path, options, size, keep: keep)
            : null) ?? Pump(path, ndjson, options, size, stopAtRows: false, keep: keep).Parser;
        var dataset = parser.Finish();
        parser.Warnings.ForEach(warn);
        if (parser.Replaced > 0)
        {
            warn(CsvDatasetReader.ReplacedWarning(path, parser.Replaced));
        }
        return new Dataset(name, path, dataset.Rows, dataset.Columns, new RowNumbers(dataset.Rows, ndjson ? 1 : 0))
        {
            VariableNames = parser.ColumnList.Select(c => c.Name!).ToList(),
            Label = dataset.Label,
            ContentSha256 = digest.GetAwaiter().GetResult(),
        };
    }

    /// <summary>Where the sequential pass stopped: just after the '[' that opens <c>rows</c>, with the reader's state there.</summary>
    internal sealed record PumpResult(Parser Parser, long RowsStart, JsonReaderState State, bool StoppedAtRows);

    /// <summary>
    /// Passes the file's tokens to a parser, front to back in blocks, from <paramref name="from"/> (with the reader state
    /// <paramref name="resume"/> there, continuing <paramref name="parser"/>); with <paramref name="stopAtRows"/>, stops
    /// where the rows begin, so that they can be read in parts.
    /// </summary>
    internal static PumpResult Pump(string path, bool ndjson, DataReadOptions options, long size, bool stopAtRows,
        long from = 0, JsonReaderState? resume = null, Parser? parser = null, Func<string, bool>? keep = null)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        stream.Position = from;
        parser ??= new Parser(path, ndjson, options, size, keep: keep);
        var buffer = new byte[BlockBytes];
        var length = 0;
        var final = false;
        var first = from == 0;
        long offset = from;
        var state = resume ?? new JsonReaderState(new JsonReaderOptions { AllowMultipleValues = ndjson, CommentHandling = JsonCommentHandling.Disallow });
        try
        {
            while (true)
            {
                if (!final)
                {
                    var read = stream.Read(buffer, length, buffer.Length - length);
                    final = read == 0;
                    length += read;
                }
                var start = 0;
                if (first && length >= 3 && buffer[0] == 0xEF && buffer[1] == 0xBB && buffer[2] == 0xBF)
                {
                    start = 3;
                }
                first = false;
                var reader = new Utf8JsonReader(buffer.AsSpan(start, length - start), final, state);
                while (reader.Read())
                {
                    parser.Token(ref reader);
                    if (stopAtRows && parser.AtRowsStart)
                    {
                        return new PumpResult(parser, offset + start + reader.BytesConsumed, reader.CurrentState, true);
                    }
                }
                if (final)
                {
                    break;
                }
                var consumed = start + (int)reader.BytesConsumed;
                state = reader.CurrentState;
                Buffer.BlockCopy(buffer, consumed, buffer, 0, length - consumed);
                length -= consumed;
                offset += consumed;
                if (length == buffer.Length)
                {
                    Array.Resize(ref buffer, buffer.Length * 2);
                }
            }
        }
        catch (JsonException e)
        {
            throw new DataException(path, null, null,
                $"invalid JSON at line {e.LineNumber + 1}, byte {e.BytePositionInLine + 1} ({parser.Where}): {Reason(e.Message)}");
        }
        catch (InvalidOperationException)
        {
            // A text of the metadata (a name, a label) that is not a string: invalid UTF-8, or a lone surrogate escape.
            throw new DataException(path, null, null,
                $"{parser.Where}: a text is not valid UTF-8 or holds a lone UTF-16 surrogate escape (such as \\ud800 without its pair); Dataset-JSON files are UTF-8");
        }
        return new PumpResult(parser, -1, default, false);
    }

    /// <summary>The reader's description of the fault without its own position (reported in our words).</summary>
    internal static string Reason(string message)
    {
        var at = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
        var text = (at >= 0 ? message[..at] : message).Trim().TrimEnd('.');
        return text.Contains("depth to be zero", StringComparison.Ordinal) || text.Contains("does not contain any JSON tokens", StringComparison.Ordinal)
            || text.Contains("reached end of data", StringComparison.Ordinal)
            ? "the file ends before the JSON is complete (unterminated)"
            : text;
    }

    /// <summary>The state of one pass through the tokens.</summary>
    internal sealed class Parser(string path, bool ndjson, DataReadOptions options, long fileBytes, bool rowsOnly = false,
        Func<string, bool>? keep = null)
    {
        private enum Section { Top, Columns, Rows, Skip }

        private readonly List<DatasetJsonColumn> _columns = [];
        /// <summary>One builder per column; none for a column the run skips (its values are passed over, unchecked).</summary>
        private TypedColumnBuilder?[]? _builders;
        private Section _section = rowsOnly ? Section.Rows : Section.Top;
        private int _skipDepth;
        private string? _property;
        private string? _columnProperty;
        private DatasetJsonColumn? _column;
        private bool _columnsSeen;
        private bool _topSeen;
        private bool _topClosed;
        private long? _records;
        private string? _label;
        private int _rows;
        private int _cell = -1;
        private readonly int _rowDepth = ndjson || rowsOnly ? 0 : 2;

        /// <summary>True just after the '[' opening <c>rows</c> (before any row).</summary>
        public bool AtRowsStart => _section == Section.Rows && _cell < 0 && _rows == 0 && !rowsOnly;

        /// <summary>The rows read so far (complete rows).</summary>
        public int Rows => _rows;

        /// <summary>True while inside a row.</summary>
        public bool InRow => _cell >= 0;

        public IReadOnlyList<DatasetJsonColumn> ColumnList => _columns;

        public TypedColumnBuilder?[]? Builders => _builders;

        /// <summary>A parser of rows only (a part of the rows), with the columns the metadata gave.</summary>
        public static Parser ForRows(Parser metadata, int capacity)
        {
            var rows = new Parser(path: metadata.FilePath, ndjson: false, metadata.Options, 0, rowsOnly: true, keep: metadata.Keep);
            rows._columns.AddRange(metadata._columns);
            rows._columnsSeen = true;
            rows._builders = rows.NewBuilders(capacity);
            return rows;
        }

        /// <summary>Takes the rows that parts read (joined), in place of rows of its own.</summary>
        public void AdoptRows(int rows, TypedColumnBuilder?[] builders, int replaced)
        {
            _rows = rows;
            _builders = builders;
            Replaced += replaced;
        }

        private string FilePath => path;

        private Func<string, bool>? Keep => keep;

        private TypedColumnBuilder?[] NewBuilders(int capacity) => _columns
            .Select(c => keep is null || keep(c.Name!) ? new TypedColumnBuilder(c.Name!, KindOf(c), capacity) { Label = c.Label } : null)
            .ToArray();

        private DataReadOptions Options => options;

        public int Replaced { get; private set; }

        public List<string> Warnings { get; } = [];

        private readonly HashSet<string> _fractionalIntegers = new(StringComparer.Ordinal);

        /// <summary>Where the reader is, for messages.</summary>
        public string Where => _cell >= 0 ? $"row {_rows + 1}" : _rows > 0 ? $"after row {_rows}"
            : _section == Section.Columns ? $"in columns[{_columns.Count}]" : _columnsSeen ? "before the first row" : "in the metadata";

        private DataException Error(string problem) => new(path, null, null, problem);

        private DataException RowError(string problem) =>
            Error($"row {_rows + 1}{(_cell >= 0 && _cell < _columns.Count ? $", column {_columns[_cell].Name}" : "")}: {problem}");

        public void Token(ref Utf8JsonReader reader)
        {
            var depth = reader.CurrentDepth;
            var token = reader.TokenType;
            if (_section == Section.Skip)
            {
                if ((token is JsonTokenType.EndObject or JsonTokenType.EndArray) && depth == _skipDepth)
                {
                    _section = _skipDepth <= 1 ? Section.Top : Section.Columns;
                }
                return;
            }
            if (_cell >= 0)
            {
                Cell(ref reader, depth, token);
                return;
            }
            if (token == JsonTokenType.StartArray && depth == _rowDepth && (_section == Section.Rows || (ndjson && _topClosed)))
            {
                if (_builders is null)
                {
                    throw RowError("the rows come before the columns; OutputForge reads the file in one pass and needs \"columns\" first");
                }
                _cell = 0;
                return;
            }
            if (depth == 0)
            {
                if (token == JsonTokenType.StartObject && !_topSeen)
                {
                    _topSeen = true;
                    return;
                }
                if (token == JsonTokenType.EndObject && !_topClosed)
                {
                    _topClosed = true;
                    return;
                }
                throw Error(ndjson
                    ? $"line {_rows + 2}: expected {(_topSeen ? "a row (a JSON array)" : "the metadata object on the first line")}, found {Describe(token)}"
                    : $"expected one JSON object (the dataset), found {Describe(token)}");
            }
            switch (_section)
            {
                case Section.Top:
                    Top(ref reader, depth, token);
                    break;
                case Section.Columns:
                    Column(ref reader, depth, token);
                    break;
                case Section.Rows:
                    if (token == JsonTokenType.EndArray && depth == 1)
                    {
                        _section = Section.Top;
                        return;
                    }
                    throw RowError($"expected a row (a JSON array of values), found {Describe(token)}");
            }
        }

        private void Top(ref Utf8JsonReader reader, int depth, JsonTokenType token)
        {
            if (token == JsonTokenType.PropertyName)
            {
                _property = reader.GetString();
                return;
            }
            switch (_property)
            {
                case "columns" when token == JsonTokenType.StartArray:
                    if (_columnsSeen) throw Error("\"columns\" appears twice");
                    _columnsSeen = true;
                    _section = Section.Columns;
                    return;
                case "rows" when token == JsonTokenType.StartArray:
                    if (ndjson) throw Error("line 1: the metadata of an NDJSON file holds no \"rows\"; each row is a line of its own");
                    if (_builders is null) throw Error("\"rows\" comes before \"columns\"; OutputForge reads the file in one pass and needs \"columns\" first");
                    _section = Section.Rows;
                    return;
                case "records" when token == JsonTokenType.Number:
                    _records = reader.TryGetInt64(out var records) && records >= 0 ? records
                        : throw Error("\"records\" must be a whole number of at least 0");
                    return;
                case "datasetJSONVersion" when token == JsonTokenType.String:
                    var version = reader.GetString()!;
                    if (!version.StartsWith("1.1", StringComparison.Ordinal))
                    {
                        throw Error($"datasetJSONVersion \"{version}\": OutputForge reads Dataset-JSON 1.1");
                    }
                    return;
                case "label" when token == JsonTokenType.String:
                    _label = reader.GetString();
                    return;
            }
            if (token is JsonTokenType.StartObject or JsonTokenType.StartArray)
            {
                if (_property is "columns" or "rows")
                {
                    throw Error($"\"{_property}\" must be an array, found {Describe(token)}");
                }
                _section = Section.Skip;
                _skipDepth = depth;
            }
            else if (_property is "columns" or "rows" or "records")
            {
                throw Error($"\"{_property}\" must be {(_property == "records" ? "a number" : "an array")}, found {Describe(token)}");
            }
        }

        private void Column(ref Utf8JsonReader reader, int depth, JsonTokenType token)
        {
            if (depth == 1 && token == JsonTokenType.EndArray)
            {
                StartRows();
                _section = Section.Top;
                return;
            }
            if (depth == 2 && token == JsonTokenType.StartObject)
            {
                _column = new DatasetJsonColumn();
                return;
            }
            if (depth == 2 && token == JsonTokenType.EndObject)
            {
                CheckColumn(_column!);
                _columns.Add(_column!);
                _column = null;
                return;
            }
            if (_column is null)
            {
                throw Error($"columns[{_columns.Count}]: expected an object describing a column, found {Describe(token)}");
            }
            if (token == JsonTokenType.PropertyName)
            {
                _columnProperty = reader.GetString();
                return;
            }
            if (token is JsonTokenType.StartObject or JsonTokenType.StartArray)
            {
                _section = Section.Skip;
                _skipDepth = depth;
                return;
            }
            var text = token == JsonTokenType.String ? reader.GetString() : null;
            int? number = token == JsonTokenType.Number && reader.TryGetInt32(out var n) ? n : null;
            switch (_columnProperty)
            {
                case "itemOID": _column.ItemOid = text; break;
                case "name": _column.Name = text; break;
                case "label": _column.Label = text; break;
                case "dataType": _column.DataType = text ?? throw Error($"columns[{_columns.Count}].dataType must be a string"); break;
                case "targetDataType": _column.TargetDataType = text; break;
                case "length": _column.Length = number; break;
                case "displayFormat": _column.DisplayFormat = text; break;
                case "keySequence": _column.KeySequence = number; break;
            }
        }

        private void CheckColumn(DatasetJsonColumn column)
        {
            var at = $"columns[{_columns.Count}]";
            if (string.IsNullOrWhiteSpace(column.Name))
            {
                throw Error($"{at}: the column has no \"name\"");
            }
            if (column.DataType is null || !DatasetJsonColumn.DataTypes.Contains(column.DataType))
            {
                throw Error($"{at} ({column.Name}): dataType {(column.DataType is null ? "is missing" : $"\"{column.DataType}\" is unknown")} (expected one of {string.Join(", ", DatasetJsonColumn.DataTypes)})");
            }
            if (_columns.FindIndex(c => string.Equals(c.Name, column.Name, StringComparison.OrdinalIgnoreCase)) is var other && other >= 0)
            {
                throw Error($"{at}: the column name {column.Name} appears twice (columns[{other}] and {at})");
            }
        }

        private void StartRows()
        {
            if (_columns.Count == 0)
            {
                throw Error("\"columns\" lists no column");
            }
            // A first guess at the rows from the file's size; the builders grow when there are more.
            var capacity = (int)Math.Min(_records ?? fileBytes / Math.Max(16, _columns.Count * 8), 1 << 24);
            _builders = NewBuilders(capacity);
        }

        private static VariableKind KindOf(DatasetJsonColumn column) =>
            column.IsNumber ? VariableKind.Number : column.DataType == "date" ? VariableKind.Date : VariableKind.Text;

        private void Cell(ref Utf8JsonReader reader, int depth, JsonTokenType token)
        {
            if (token == JsonTokenType.EndArray && depth == _rowDepth)
            {
                if (_cell != _columns.Count)
                {
                    var count = _cell;
                    _cell = -1;
                    throw Error($"row {_rows + 1} has {count} value{(count == 1 ? "" : "s")}, but \"columns\" lists {_columns.Count}");
                }
                _cell = -1;
                _rows++;
                return;
            }
            if (_cell >= _columns.Count)
            {
                throw Error($"row {_rows + 1} has more values than the {_columns.Count} \"columns\" lists");
            }
            var column = _columns[_cell];
            if (_builders![_cell] is not { } builder)
            {
                // A column the run skips: the value is neither decoded nor stored, but its JSON type is still held to the
                // column's dataType (a cheap test of the token), so that a file is refused alike whatever a run reads.
                var fits = token switch
                {
                    JsonTokenType.Null => true,
                    JsonTokenType.String => reader.ValueSpan.Length == 0 || column.Type == ColumnType.Decimal || !(column.IsNumber || column.Type == ColumnType.Boolean),
                    JsonTokenType.Number => column.IsNumber,
                    JsonTokenType.True or JsonTokenType.False => column.Type == ColumnType.Boolean,
                    _ => false,
                };
                if (fits)
                {
                    if (token == JsonTokenType.String)
                    {
                        SkippedString(ref reader, column);
                    }
                    else if (token == JsonTokenType.Number && !CanonicalText.TryParseNumber(reader.ValueSpan, out _, out _)
                        && (!reader.TryGetDouble(out var skippedNumber) || !UnusableNumber.IsUsable(skippedNumber)))
                    {
                        // A number no statistic can use is refused in a skipped column too (UnusableNumber).
                        var written = Encoding.UTF8.GetString(reader.ValueSpan);
                        var parsed = double.TryParse(written, NumberStyles.Float, CultureInfo.InvariantCulture, out var value);
                        throw RowError($"'{Shorten(written)}' {UnusableNumber.Problem(written, parsed, value) ?? "is not a number"}");
                    }
                    _cell++;
                    return;
                }
                throw token == JsonTokenType.String
                    ? RowError($"expected {Expected(column)} (dataType {column.DataType}), found the string \"{Shorten(reader.GetString()!)}\"")
                    : RowError($"expected {Expected(column)} (dataType {column.DataType}), found {Describe(token)}");
            }
            switch (token)
            {
                case JsonTokenType.Null:
                    builder.AddMissing();
                    break;
                case JsonTokenType.String:
                    StringCell(ref reader, column, builder);
                    break;
                case JsonTokenType.Number when column.IsNumber:
                    var raw = reader.ValueSpan;
                    if (CanonicalText.TryParseNumber(raw, out var canonical, out var decimals)
                        && (decimals == 0 || column.Type != ColumnType.Integer))
                    {
                        builder.AddCanonical(canonical, decimals);
                        break;
                    }
                    if (!reader.TryGetDouble(out var number) || !UnusableNumber.IsUsable(number))
                    {
                        // NaN, an infinity, an overflow or a magnitude beyond 1e100: the rule of every reader (UnusableNumber).
                        var written = Encoding.UTF8.GetString(raw);
                        var parsed = double.TryParse(written, NumberStyles.Float, CultureInfo.InvariantCulture, out var value);
                        throw RowError($"'{Shorten(written)}' {UnusableNumber.Problem(written, parsed, value) ?? "is not a number"}");
                    }
                    if (column.Type == ColumnType.Integer && number != Math.Floor(number) && _fractionalIntegers.Add(column.Name!))
                    {
                        // Published files do this (a percent change declared integer): the number is kept, and said.
                        Warnings.Add($"{path}: column {column.Name} is declared integer but holds numbers with a fraction (first in row {_rows + 1}: {Encoding.UTF8.GetString(raw)}); they are read as they are written");
                    }
                    builder.AddNumber(number, raw);
                    break;
                case JsonTokenType.True or JsonTokenType.False when column.Type == ColumnType.Boolean:
                    builder.AddText(token == JsonTokenType.True ? "true" : "false");
                    break;
                default:
                    throw RowError($"expected {Expected(column)} (dataType {column.DataType}), found {Describe(token)}");
            }
            _cell++;
        }

        /// <summary>
        /// A text of a column the run skips is held to the rule of every value (UTF-8, <see cref="TextValueRule"/>) though
        /// it is not stored, so that a file is refused, or its values replaced and counted, alike whatever a run reads.
        /// </summary>
        private void SkippedString(ref Utf8JsonReader reader, DatasetJsonColumn column)
        {
            if (!System.Text.Unicode.Utf8.IsValid(reader.ValueSpan))
            {
                throw RowError("the value is not valid UTF-8 (Latin-1 or another encoding?); Dataset-JSON files are UTF-8");
            }
            string? text = null;
            var bytes = ReadOnlySpan<byte>.Empty;
            if (reader.ValueIsEscaped)
            {
                text = TextValueRule.Unpadded(EscapedText(ref reader));
                if (text is null)
                {
                    return;
                }
            }
            else
            {
                bytes = TextValueRule.Unpadded(reader.ValueSpan);
                if (bytes.IsEmpty)
                {
                    return;
                }
                if (TextValueRule.MayHoldForbidden(bytes) || bytes.Length > DocumentText.MaxLength)
                {
                    text = DecodeText(bytes);
                }
            }
            if (text is not null)
            {
                var replaced = 0;
                text = TextValueRule.Checked(text, options.ControlCharacters, ref replaced, out var problem) ?? throw RowError(problem!);
                Replaced += replaced;
            }
            if (column.Type == ColumnType.Decimal && (text is not null || !CanonicalText.TryParseNumber(bytes, out _, out _)))
            {
                // A decimal no statistic can use is refused in a skipped column too (UnusableNumber).
                text ??= DecodeText(bytes);
                var parsed = double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value);
                if (UnusableNumber.Problem(text, parsed, value) is { } unusable)
                {
                    throw RowError($"'{Shorten(text)}' {unusable}");
                }
                if (!parsed)
                {
                    throw RowError($"expected a decimal number, found \"{Shorten(text)}\"");
                }
            }
        }

        private void StringCell(ref Utf8JsonReader reader, DatasetJsonColumn column, TypedColumnBuilder builder)
        {
            // Trailing blanks, the document text limits and control characters: the rule of every reader (TextValueRule).
            // A value without escapes stays bytes while it can (a repeated value is then never decoded again); one with
            // escapes, or with a byte that may be a forbidden character, is looked at as text.
            if (!System.Text.Unicode.Utf8.IsValid(reader.ValueSpan))
            {
                // Decoding would silently turn the bytes into U+FFFD (a raw surrogate, ED A0 80, is such bytes too).
                throw RowError("the value is not valid UTF-8 (Latin-1 or another encoding?); Dataset-JSON files are UTF-8");
            }
            var replaced = 0;
            string? text = null;
            var bytes = ReadOnlySpan<byte>.Empty;
            if (reader.ValueIsEscaped)
            {
                text = TextValueRule.Unpadded(EscapedText(ref reader));
                if (text is null)
                {
                    builder.AddMissing();
                    return;
                }
                text = TextValueRule.Checked(text, options.ControlCharacters, ref replaced, out var problem) ?? throw RowError(problem!);
            }
            else
            {
                bytes = TextValueRule.Unpadded(reader.ValueSpan);
                if (bytes.IsEmpty)
                {
                    builder.AddMissing();
                    return;
                }
                if (TextValueRule.MayHoldForbidden(bytes) || bytes.Length > DocumentText.MaxLength)
                {
                    text = TextValueRule.Checked(DecodeText(bytes), options.ControlCharacters, ref replaced, out var problem) ?? throw RowError(problem!);
                }
            }
            Replaced += replaced;
            if (column.Type == ColumnType.Decimal && text is null && CanonicalText.TryParseNumber(bytes, out var canonical, out var decimals))
            {
                builder.AddCanonical(canonical, decimals);
                return;
            }
            if (column.Type == ColumnType.Date && text is null && builder.Kind == VariableKind.Date && CanonicalText.TryParseDate(bytes, out var day))
            {
                builder.AddDay(day);
                return;
            }
            if (column.Type == ColumnType.Decimal)
            {
                // Dataset-JSON 1.1 writes decimals as strings so that their digits are kept exactly.
                var digits = text is null ? bytes.ToArray() : Encoding.UTF8.GetBytes(text);
                text ??= DecodeText(bytes);
                var parsed = double.TryParse(digits, NumberStyles.Float, CultureInfo.InvariantCulture, out var value);
                if (UnusableNumber.Problem(text, parsed, value) is { } unusable)
                {
                    // NaN, an infinity, an overflow, a magnitude beyond 1e100, a decimal comma: the rule of every reader.
                    throw RowError($"'{Shorten(text)}' {unusable}");
                }
                if (!parsed)
                {
                    throw RowError($"expected a decimal number, found \"{Shorten(text)}\"");
                }
                builder.AddNumber(value, digits);
                return;
            }
            if (column.IsNumber || column.Type == ColumnType.Boolean)
            {
                throw RowError($"expected {Expected(column)} (dataType {column.DataType}), found the string \"{Shorten(text ?? DecodeText(bytes))}\"");
            }
            if (column.Type == ColumnType.Date)
            {
                builder.AddDateText(text ?? DecodeText(bytes));
                return;
            }
            if (text is null)
            {
                builder.AddText(bytes, DecodeText);
                return;
            }
            builder.AddText(text);
        }

        /// <summary>
        /// A string value with escapes, resolved. A lone surrogate escape (\ud800 without its pair) is half of a character,
        /// which System.Text.Json refuses to give as a string: it is then kept as the lone UTF-16 unit
        /// (<see cref="JsonEscapes"/>), for the text rule to refuse or replace like any forbidden character.
        /// </summary>
        private static string EscapedText(ref Utf8JsonReader reader)
        {
            try
            {
                return reader.GetString()!;
            }
            catch (InvalidOperationException)
            {
                return JsonEscapes.Resolve(reader.ValueSpan);
            }
        }

        private static readonly TypedColumnBuilder.Decoder DecodeText = bytes => Encoding.UTF8.GetString(bytes);

        private static string Expected(DatasetJsonColumn column) => column.DataType switch
        {
            "integer" => "an integer",
            "float" or "double" or "decimal" => "a number",
            "boolean" => "true or false",
            "date" => "an ISO 8601 date string",
            _ => "a string",
        };

        private static string Describe(JsonTokenType token) => token switch
        {
            JsonTokenType.StartObject => "an object",
            JsonTokenType.StartArray => "an array",
            JsonTokenType.String => "a string",
            JsonTokenType.Number => "a number",
            JsonTokenType.True or JsonTokenType.False => "a boolean",
            JsonTokenType.Null => "null",
            _ => token.ToString(),
        };

        private static string Shorten(string value) => value.Length <= 20 ? value : value[..20] + "...";

        public (int Rows, List<DataColumn> Columns, string? Label) Finish()
        {
            if (!_columnsSeen)
            {
                throw Error(ndjson ? "line 1: the metadata has no \"columns\"" : "the dataset has no \"columns\"");
            }
            if (!ndjson && _section != Section.Top)
            {
                throw Error("the file ends before the dataset is complete");
            }
            _builders ??= [];
            if (_records is { } records && records != _rows)
            {
                throw Error(FormattableString.Invariant($"\"records\" gives {records:N0} rows, but the file holds {_rows:N0}"));
            }
            return (_rows, _builders.OfType<TypedColumnBuilder>().Select(b => b.Build()).ToList(), _label);
        }
    }
}
