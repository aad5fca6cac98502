using System.Text;
using CsvHelper;
using OutputForge.Common;

namespace OutputForge.Data;

/// <summary>
/// Reads one ADaM-style CSV file (a header row of variable names, RFC 4180 quoting, UTF-8) into a
/// <see cref="Dataset"/> with typed columns. Every problem is a <see cref="DataException"/> naming
/// the file, line and variable. Trailing blanks of a value are dropped (transport-file padding), so
/// every key and text comparison (USUBJID, arms, PARAMCD, AVISIT, conditions) ignores them.
/// </summary>
public static class CsvDatasetReader
{
    /// <summary>
    /// The longest value read, in characters. ADaM text variables hold at most 200 characters (the
    /// version 5 transport files of regulatory submissions; common practice); a field far beyond that
    /// is a broken file (e.g. a lost closing quote).
    /// </summary>
    public const int MaxFieldLength = 1 << 20;

    public static Dataset Read(string name, string path) => Read(name, path, DataReadOptions.Default, _ => { });

    /// <summary>Reads with <paramref name="options"/>; <paramref name="warn"/> receives the warnings (e.g. replaced control characters).</summary>
    public static Dataset Read(string name, string path, DataReadOptions options, Action<string> warn)
    {
        var file = CsvFileParts.Open(name, path, options);
        Parallel.For(0, file.Count, file.Read);
        return file.Finish(warn);
    }

    /// <summary>
    /// Reads the whole file on one thread, from the start: every problem is reported, as a <see cref="DataException"/>,
    /// at its place in the file, the first one first.
    /// </summary>
    internal static Dataset ReadWhole(string name, string path, byte[] bytes, DataReadOptions options, Action<string> warn)
    {
        var bodyStart = CheckEncoding(path, bytes);
        return Parse(name, path, bytes, bodyStart, options, warn);
    }

    internal static int CheckEncoding(string path, byte[] bytes)
    {
        if (bytes.Length == 0)
        {
            throw new DataException(path, null, null, "the file is empty (expected a header row of variable names)");
        }
        if (bytes.Length >= 2 && ((bytes[0] == 0xFF && bytes[1] == 0xFE) || (bytes[0] == 0xFE && bytes[1] == 0xFF)))
        {
            throw new DataException(path, 1, null, "the file is UTF-16 encoded; save it as UTF-8");
        }
        var start = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
        var nul = Array.IndexOf(bytes, (byte)0, start);
        if (nul >= 0)
        {
            throw new DataException(path, LineAt(bytes, nul), null, "the file contains a NUL byte (is it a binary or UTF-16 file?)");
        }
        try
        {
            _ = new UTF8Encoding(false, true).GetCharCount(bytes, start, bytes.Length - start);
            return start;
        }
        catch (DecoderFallbackException e)
        {
            var at = start + Math.Max(0, e.Index);
            throw new DataException(path, LineAt(bytes, at), null,
                "the file is not valid UTF-8 (Latin-1 or another encoding?); save it as UTF-8");
        }
    }

    private static int LineAt(byte[] bytes, int index)
    {
        var line = 1;
        for (var i = 0; i < index && i < bytes.Length; i++)
        {
            if (bytes[i] == (byte)'\n')
            {
                line++;
            }
        }
        return line;
    }

    internal static CsvReaderOptions ReaderOptions() => new()
    {
        HasHeader = false,
        Separator = ',',
        Mode = CsvMode.Rfc4180,
        AllowLineBreaksInQuotes = true,
        SkipEmptyLines = false,
        TrimWhitespace = false,
        TrackLineNumbers = true,
        MalformedData = CsvMalformedDataHandling.Throw,
        FieldCountMismatch = CsvFieldCountHandling.Allow,
        MissingField = CsvMissingFieldHandling.ReturnEmpty,
        IncludeValuesInExceptions = false,
        PoolStrings = true,
    };

    private static Dataset Parse(string name, string path, byte[] bytes, int bodyStart, DataReadOptions options, Action<string> warn)
    {
        try
        {
            using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(bytes, bodyStart, bytes.Length - bodyStart), ReaderOptions());
            if (!reader.Read())
            {
                throw new DataException(path, 1, null, "the file has no header row");
            }
            var header = Fields(reader);
            CheckHeader(path, header);
            var capacity = LineBreaks.Bound(bytes.AsSpan(bodyStart));
            var keep = options.KeepOf(name);
            var columns = header.Select(h => keep is null || keep(h) ? new ColumnBuilder(h, capacity) : null).ToArray();
            var lines = new int[capacity];
            var probes = columns.Select(c => c is null ? new SkippedColumnProbe() : null).ToArray();
            var (rows, replaced) = ReadRecords(reader, path, header, columns, lines, 0, 0, options, probes);
            if (replaced > 0)
            {
                warn(ReplacedWarning(path, replaced));
            }
            var built = new List<DataColumn>(columns.Length);
            DataException? first = null;
            for (var c = 0; c < columns.Length; c++)
            {
                try
                {
                    if (columns[c] is { } column)
                    {
                        built.Add(column.Build(path));
                    }
                    else if (SkippedColumnProbe.Problem([probes[c]!], path, header[c]) is { } skipped)
                    {
                        throw skipped;
                    }
                }
                catch (DataException e) when (first is null || e.Line < first.Line)
                {
                    // An unusable number: the one on the earliest line (then the leftmost column) is reported.
                    first = e;
                }
                catch (DataException)
                {
                }
            }
            if (first is not null)
            {
                throw first;
            }
            return new Dataset(name, path, rows, built, new ArraySegment<int>(lines, 0, rows)) { VariableNames = header };
        }
        catch (CsvFormatException e)
        {
            throw new DataException(path, e.LineNumber > 0 ? (int)e.LineNumber : null, null, DescribeMalformed(e));
        }
    }

    internal static string ReplacedWarning(string path, int replaced) =>
        $"{path}: {replaced} value{(replaced == 1 ? "" : "s")} held control characters, replaced by U+FFFD";

    /// <summary>
    /// Reads the records after the header into <paramref name="columns"/> (one builder per header variable; none for a
    /// variable the run skips, whose fields are passed over untouched) and their
    /// lines into <paramref name="lines"/> from <paramref name="rowOffset"/>; the reader's line numbers are counted from
    /// the start of its bytes, <paramref name="lineOffset"/> lines into the file. Returns the rows read and the number of
    /// values whose control characters were replaced.
    /// </summary>
    internal static (int Rows, int Replaced) ReadRecords(CsvReader reader, string path, string[] header, ColumnBuilder?[] columns,
        int[] lines, int rowOffset, int lineOffset, DataReadOptions options, SkippedColumnProbe?[] probes)
    {
        var rows = 0;
        var replaced = 0;
        var repeats = new RepeatedText[header.Length];
        while (reader.Read())
        {
            var line = (int)reader.LineNumber + lineOffset;
            if (reader.FieldCount == 1 && reader.IsEmpty(0) && header.Length > 1)
            {
                continue;
            }
            if (reader.FieldCount != header.Length)
            {
                throw new DataException(path, line, null,
                    $"the row has {reader.FieldCount} fields but the header has {header.Length}");
            }
            for (var c = 0; c < header.Length; c++)
            {
                if (columns[c] is null)
                {
                    if (!reader.IsEmpty(c))
                    {
                        CheckSkipped(reader, c, path, line, header[c], options, ref replaced, probes[c]!);
                    }
                    continue;
                }
                if (reader.IsEmpty(c))
                {
                    columns[c]!.AddMissing();
                    continue;
                }
                var utf8 = reader.GetSpan(c);
                if (utf8.Length == 1 && utf8[0] == (byte)'.')
                {
                    // "." alone is the missing value of transport-file dumps (docs/spec-reference.md, "Data formats").
                    columns[c]!.AddMissing();
                    continue;
                }
                if (columns[c]!.TryAddCanonical(utf8))
                {
                    continue;
                }
                if (repeats[c].Matches(utf8) is { } repeated)
                {
                    columns[c]!.AddText(repeated, line);
                    continue;
                }
                // Trailing blanks, the document text limits and control characters: the rule of every reader (TextValueRule).
                var value = TextValueRule.Unpadded(reader.GetString(c));
                if (value is null)
                {
                    columns[c]!.AddMissing();
                    continue;
                }
                if (value.Length > MaxFieldLength)
                {
                    throw new DataException(path, line, header[c],
                        FormattableString.Invariant($"a value of {value.Length:N0} characters, more than the {MaxFieldLength:N0} OutputForge reads (ADaM text values hold at most 200); is a closing quote missing?"));
                }
                var read = value;
                value = TextValueRule.Checked(value, options.ControlCharacters, ref replaced, out var problem, TextValueRule.MayHoldForbidden(utf8))
                    ?? throw new DataException(path, line, header[c], problem!);
                if (ReferenceEquals(value, read))
                {
                    // Only values kept as read are remembered (RepeatedText).
                    repeats[c].Remember(utf8, value);
                }
                columns[c]!.AddText(value, line);
            }
            lines[rowOffset + rows++] = line;
        }
        return (rows, replaced);
    }

    /// <summary>
    /// A field of a variable the run skips is neither typed nor stored, but held to the same rule as any value
    /// (<see cref="TextValueRule"/>: its length, control characters), so that a file is refused, or its values replaced
    /// and counted, alike whatever a run reads of it. Most fields pass on a look at their bytes; only a suspect one is decoded.
    /// </summary>
    private static void CheckSkipped(CsvReader reader, int c, string path, int line, string variable, DataReadOptions options, ref int replaced,
        SkippedColumnProbe probe)
    {
        var utf8 = reader.GetSpan(c);
        if (!(utf8.Length == 1 && utf8[0] == (byte)'.'))
        {
            probe.Add(utf8, () => reader.GetString(c), line);
        }
        var mayHoldForbidden = TextValueRule.MayHoldForbidden(utf8);
        if (utf8.Length <= Math.Min(MaxFieldLength, DocumentText.MaxLength) && !mayHoldForbidden)
        {
            return;
        }
        var value = TextValueRule.Unpadded(reader.GetString(c));
        if (value is null)
        {
            return;
        }
        if (value.Length > MaxFieldLength)
        {
            throw new DataException(path, line, variable,
                FormattableString.Invariant($"a value of {value.Length:N0} characters, more than the {MaxFieldLength:N0} OutputForge reads (ADaM text values hold at most 200); is a closing quote missing?"));
        }
        _ = TextValueRule.Checked(value, options.ControlCharacters, ref replaced, out var problem, mayHoldForbidden)
            ?? throw new DataException(path, line, variable, problem!);
    }

    internal static string[] Fields(CsvReader reader)
    {
        var fields = new string[reader.FieldCount];
        for (var c = 0; c < fields.Length; c++)
        {
            fields[c] = reader.GetString(c).Trim();
        }
        return fields;
    }

    /// <summary>
    /// The faults the CSV reader (CsvHelper 34, RFC 4180 mode) reports in malformed input. Its exception gives the record,
    /// line and byte offset as properties but the fault only inside its message, so the fault is recognized by the
    /// reader's fixed wording of it and our message says it in the same words, with the position we report ourselves.
    /// </summary>
    private static readonly string[] MalformedFaults =
    [
        "a quote inside an unquoted field",
        "text after the closing quote of a quoted field",
        "a quoted field that is never closed",
        "a line break inside a quoted field",
    ];

    private static string DescribeMalformed(CsvFormatException e)
    {
        var fault = MalformedFaults.FirstOrDefault(f => e.Message.Contains(f, StringComparison.Ordinal)) ?? "the record does not follow RFC 4180";
        return $"malformed CSV: {fault} (RFC 4180 quoting expected)";
    }

    internal static void CheckHeader(string path, string[] header)
    {
        var seen = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var c = 0; c < header.Length; c++)
        {
            var variable = header[c].Trim();
            if (variable.Length == 0)
            {
                throw new DataException(path, 1, null, $"column {c + 1} of the header has no variable name");
            }
            if (seen.TryGetValue(variable, out var first))
            {
                throw new DataException(path, 1, variable, $"the variable name appears twice in the header (columns {first + 1} and {c + 1})");
            }
            seen[variable] = c;
        }
    }
}
