using System.Globalization;
using System.Text;
using OutputForge.Expressions;
using OutputForge.Common;

namespace OutputForge.Data.Xpt;

/// <summary>
/// Reads one dataset from an XPT version 5 transport file, streaming: the file is read once, front to back, in
/// blocks, and only the typed columns are kept (never the whole file). Layout (from the published description of
/// the format): 80-byte records; a library header and two records of its details; a member header, a descriptor
/// header and two records of the member's details (name, label); a namestr header giving the number of variables;
/// the namestrs (140 bytes each, packed, padded to a whole record); an observation header; then the observations,
/// each the variables' bytes at their positions, packed without regard to record ends, the last record padded
/// with blanks. Character values are blank-padded; numbers are IBM hexadecimal floating point (<see cref="IbmFloat"/>).
/// Values become columns as the CSV reader gives them (<see cref="TypedColumnBuilder"/>): numbers; dates (a numeric
/// variable with a date format, <see cref="TemporalFormats"/>) as dates; datetimes and times as ISO 8601 text
/// (YYYY-MM-DDThh:mm:ss, hh:mm:ss); character values without their trailing blanks, a blank value missing.
/// Every problem is a <see cref="DataException"/> naming the file and the record or row.
/// </summary>
public static class XptDatasetReader
{
    public const int RecordLength = 80;

    private const string LibraryHeader = "HEADER RECORD*******LIBRARY HEADER RECORD!!!!!!!000000000000000000000000000000  ";
    private const string LibraryV8Header = "HEADER RECORD*******LIBV8   HEADER RECORD!!!!!!!";
    private const string MemberHeader = "HEADER RECORD*******MEMBER  HEADER RECORD!!!!!!!";
    private const string DescriptorHeader = "HEADER RECORD*******DSCRPTR HEADER RECORD!!!!!!!";
    private const string NamestrHeader = "HEADER RECORD*******NAMESTR HEADER RECORD!!!!!!!";
    private const string ObservationHeader = "HEADER RECORD*******OBS     HEADER RECORD!!!!!!!";

    /// <summary>Day 0 of the transport format's dates and second 0 of its datetimes.</summary>
    private static readonly DateOnly Epoch = new(1960, 1, 1);

    private static readonly UTF8Encoding StrictUtf8 = new(false, true);

    public static Dataset Read(string name, string path) => Read(name, path, DataReadOptions.Default, _ => { });

    /// <summary>
    /// Reads the file's one dataset, or, with <paramref name="member"/> (the study spec's "member" of the dataset's
    /// entry), the member of that name from a file of several: the members before it are passed over and the file is
    /// scanned for the end of its rows (the next member header) before they are read.
    /// </summary>
    public static Dataset Read(string name, string path, DataReadOptions options, Action<string> warn, string? member = null)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        var digest = StreamedFileDigest.Start(path);
        var input = new RecordInput(stream, path);
        ReadLibraryHeader(input);
        XptVariable[] variables;
        int rowLength;
        string? datasetLabel;
        long dataStart;
        long dataEnd;
        var seen = new List<string>();
        while (true)
        {
            (variables, rowLength) = ReadHeaders(input, out datasetLabel, out var memberName);
            seen.Add(memberName);
            dataStart = input.Position;
            dataEnd = member is null ? stream.Length : NextMemberHeader(input.Handle, dataStart, stream.Length) ?? stream.Length;
            if (member is null || string.Equals(memberName, member, StringComparison.OrdinalIgnoreCase))
            {
                break;
            }
            if (dataEnd == stream.Length)
            {
                throw new DataException(path, null, null,
                    $"the file has no member {member} (the study spec's \"member\" of dataset '{name}'); its members: {string.Join(", ", seen)}");
            }
            input.Seek(dataEnd);
        }
        var dataBytes = dataEnd - dataStart;
        if (dataBytes % RecordLength != 0)
        {
            throw new DataException(path, null, null,
                FormattableString.Invariant($"record {dataStart / RecordLength + dataBytes / RecordLength + 1}: the file ends inside an 80-byte record (it is {stream.Length:N0} bytes, not a whole number of records); is it truncated?"));
        }
        var rows = CountRows(stream, dataEnd, dataBytes, rowLength, path);
        if (rows > Array.MaxLength)
        {
            throw new DataException(path, null, null, FormattableString.Invariant($"{rows:N0} observations, more than one dataset can hold"));
        }
        // A variable the run skips has no builder: its bytes in each row are passed over undecoded.
        var keep = options.KeepOf(name);
        var builders = variables.Select(v => keep is null || keep(v.Name)
            ? new TypedColumnBuilder(v.Name, KindOf(v), (int)rows) { Label = v.Label.Length == 0 ? null : v.Label }
            : null).ToArray();
        var replaced = ReadObservations(input, dataBytes, rowLength, (int)rows, variables, builders, options, path, name);
        if (replaced > 0)
        {
            warn(CsvDatasetReader.ReplacedWarning(path, replaced));
        }
        var columns = builders.OfType<TypedColumnBuilder>().Select(b => b.Build()).ToList();
        return new Dataset(name, path, (int)rows, columns, new RowNumbers((int)rows))
        {
            Label = datasetLabel,
            VariableNames = variables.Select(v => v.Name).ToList(),
            ContentSha256 = digest.GetAwaiter().GetResult(),
        };
    }

    private static VariableKind KindOf(XptVariable variable) => !variable.IsNumeric ? VariableKind.Text : variable.Temporal switch
    {
        TemporalKind.Date => VariableKind.Date,
        TemporalKind.DateTime or TemporalKind.Time => VariableKind.Text,
        _ => VariableKind.Number,
    };

    private static void ReadLibraryHeader(RecordInput input)
    {
        var path = input.Path;
        var first = input.Next("the library header record");
        if (StartsWith(first, LibraryV8Header))
        {
            throw new DataException(path, null, null, "record 1: a transport file of version 8 or later; OutputForge reads the XPT version 5 transport format");
        }
        if (!StartsWith(first, LibraryHeader))
        {
            throw new DataException(path, null, null, $"record 1: expected the library header record of an XPT version 5 transport file (\"HEADER RECORD*******LIBRARY HEADER RECORD...\"), found \"{Shown(first)}\"");
        }
        input.Next("the library's first details record");
        input.Next("the library's second details record");
    }

    /// <summary>The headers of one member, from its member header record to its observation header record.</summary>
    private static (XptVariable[] Variables, int RowLength) ReadHeaders(RecordInput input, out string? datasetLabel, out string memberName)
    {
        var path = input.Path;
        var member = input.Next("the member header record");
        Expect(input, member, MemberHeader, "the member header record");
        var namestrLength = ParseDigits(member.Slice(74, 4));
        if (namestrLength is not (140 or 136))
        {
            throw new DataException(path, null, null, $"record {input.Record}: the member header gives namestr records of {Shown(member.Slice(74, 4))} bytes (expected 140, or 136)");
        }
        Expect(input, input.Next("the descriptor header record"), DescriptorHeader, "the descriptor header record");
        // The first details record: "SAS", then the member's name in bytes 9-16.
        memberName = XptVariable.Text(input.Next("the member's first details record").Slice(8, 8));
        var details = input.Next("the member's second details record");
        datasetLabel = XptVariable.Text(details.Slice(32, 40)) is { Length: > 0 } label ? label : null;
        var namestrHeader = input.Next("the namestr header record");
        Expect(input, namestrHeader, NamestrHeader, "the namestr header record");
        var count = ParseDigits(namestrHeader.Slice(54, 4));
        if (count is null or 0)
        {
            throw new DataException(path, null, null, $"record {input.Record}: the namestr header gives \"{Shown(namestrHeader.Slice(54, 4))}\" variables (expected a number above 0)");
        }
        var bytes = new byte[(count.Value * namestrLength.Value + RecordLength - 1) / RecordLength * RecordLength];
        var namestrRecord = input.Record + 1;
        for (var offset = 0; offset < bytes.Length; offset += RecordLength)
        {
            input.Next("the namestr records").CopyTo(bytes.AsSpan(offset));
        }
        var variables = new XptVariable[count.Value];
        var rowLength = 0;
        var names = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var v = 0; v < variables.Length; v++)
        {
            var record = new byte[XptVariable.RecordLength];
            bytes.AsSpan(v * namestrLength.Value, namestrLength.Value).CopyTo(record);
            var at = namestrRecord + v * namestrLength.Value / RecordLength;
            if (StartsWith(record, "HEADER RECORD*******"))
            {
                throw new DataException(path, null, null, $"record {at}: the namestr header announces {count} variables, but only {v} namestr records come before the next header record");
            }
            variables[v] = XptVariable.Parse(record, out var problem)
                ?? throw new DataException(path, null, null, $"record {at}: namestr {v + 1} of {count} is not a variable ({problem}); the namestr count ({count}) disagrees with the variables");
            if (!names.TryAdd(variables[v].Name, v))
            {
                throw new DataException(path, null, variables[v].Name, $"record {at}: the variable name appears twice (variables {names[variables[v].Name] + 1} and {v + 1})");
            }
            rowLength = Math.Max(rowLength, variables[v].Position + variables[v].Length);
        }
        var observation = input.Next("the observation header record");
        if (!StartsWith(observation, ObservationHeader))
        {
            var what = StartsWith(observation, "HEADER RECORD*******") ? "another header record" : "more namestr data";
            throw new DataException(path, null, null, $"record {input.Record}: expected the observation header record after the {count} namestrs the namestr header announces, found {what}; the namestr count disagrees with the variables");
        }
        return (variables, rowLength);
    }

    /// <summary>
    /// The observations in <paramref name="dataBytes"/>: whole rows, the rest blank padding. A row of blanks lying wholly
    /// in the last record is padding too (a row shorter than a record cannot be told from padding; common practice).
    /// </summary>
    private static long CountRows(FileStream stream, long dataEnd, long dataBytes, int rowLength, string path)
    {
        if (rowLength == 0) return 0;
        var rows = dataBytes / rowLength;
        if (rowLength >= RecordLength || dataBytes == 0) return rows;
        Span<byte> last = stackalloc byte[RecordLength];
        RandomAccess.Read(stream.SafeFileHandle, last, dataEnd - RecordLength);
        var lastStart = dataBytes - RecordLength;
        while (rows > 0 && (rows - 1) * rowLength >= lastStart
            && last.Slice((int)((rows - 1) * rowLength - lastStart), rowLength).IndexOfAnyExcept((byte)' ') < 0)
        {
            rows--;
        }
        return rows;
    }

    private static int ReadObservations(RecordInput input, long dataBytes, int rowLength, int rows, XptVariable[] variables,
        TypedColumnBuilder?[] builders, DataReadOptions options, string path, string name)
    {
        var replaced = 0;
        var block = Math.Max(1, (1 << 20) / (rowLength * RecordLength)) * rowLength * RecordLength;
        if (rowLength == 0) block = RecordLength * 1024;
        var buffer = new byte[block];
        long done = 0;
        var row = 0;
        var firstRecord = input.Record + 1;
        while (done < dataBytes)
        {
            var length = (int)Math.Min(buffer.Length, dataBytes - done);
            input.Fill(buffer.AsSpan(0, length));
            for (var offset = 0; offset < length; offset += RecordLength)
            {
                if (buffer[offset] == (byte)'H' && StartsWith(buffer.AsSpan(offset), MemberHeader))
                {
                    throw new DataException(path, null, null,
                        $"record {firstRecord + (done + offset) / RecordLength}: the file holds more than one dataset (members {string.Join(", ", MemberNames(input.Handle))}); name the one to read in the study spec, e.g. \"{name}\": {{ \"file\": \"{System.IO.Path.GetFileName(path)}\", \"member\": \"{MemberNames(input.Handle)[0]}\" }}");
                }
            }
            var span = buffer.AsSpan(0, length);
            while (row < rows && (long)(row + 1) * rowLength - done <= length)
            {
                var at = (int)((long)row * rowLength - done);
                replaced += ReadRow(span.Slice(at, rowLength), row + 1, variables, builders, options, path);
                row++;
            }
            done += length;
        }
        var tail = dataBytes - (long)rows * rowLength;
        if (tail > 0)
        {
            // The bytes after the last row must be blank padding: anything else is a row cut short.
            var padding = new byte[tail];
            RandomAccess.Read(input.Handle, padding, input.Position - tail);
            if (padding.AsSpan().IndexOfAnyExcept((byte)' ') >= 0)
            {
                throw new DataException(path, null, null,
                    FormattableString.Invariant($"row {rows + 1} (record {firstRecord + (long)rows * rowLength / RecordLength}): the file ends inside the row ({tail} of its {rowLength} bytes); is it truncated?"));
            }
        }
        return replaced;
    }

    /// <summary>Where the next member header record starts at or after <paramref name="from"/> (a record start), or null.</summary>
    private static long? NextMemberHeader(Microsoft.Win32.SafeHandles.SafeFileHandle handle, long from, long size)
    {
        var buffer = new byte[RecordLength * 16384];
        for (var at = from; at < size; at += buffer.Length)
        {
            var length = RandomAccess.Read(handle, buffer, at);
            for (var offset = 0; offset + RecordLength <= length; offset += RecordLength)
            {
                if (buffer[offset] == (byte)'H' && StartsWith(buffer.AsSpan(offset), MemberHeader))
                {
                    return at + offset;
                }
            }
            if (length < buffer.Length)
            {
                break;
            }
        }
        return null;
    }

    /// <summary>The names of every member of the file, in file order (for the message that the spec must name one).</summary>
    private static List<string> MemberNames(Microsoft.Win32.SafeHandles.SafeFileHandle handle)
    {
        var size = RandomAccess.GetLength(handle);
        var names = new List<string>();
        var details = new byte[RecordLength];
        for (long at = 3 * RecordLength; NextMemberHeader(handle, at, size) is { } header; at = header + RecordLength)
        {
            // The member header, the descriptor header, then the first details record with the name in bytes 9-16.
            if (RandomAccess.Read(handle, details, header + 2 * RecordLength) == RecordLength)
            {
                names.Add(XptVariable.Text(details.AsSpan(8, 8)));
            }
        }
        return names;
    }

    private static int ReadRow(ReadOnlySpan<byte> bytes, int row, XptVariable[] variables, TypedColumnBuilder?[] builders,
        DataReadOptions options, string path)
    {
        var replaced = 0;
        for (var v = 0; v < variables.Length; v++)
        {
            var variable = variables[v];
            var value = bytes.Slice(variable.Position, variable.Length);
            if (builders[v] is not { } builder)
            {
                // A variable the run skips is not stored, but a character value is held to the rule of every value
                // (TextValueRule), so that a file is refused, or its values replaced and counted, alike whatever a run reads.
                if (!variable.IsNumeric && TextValueRule.Unpadded(value) is { IsEmpty: false } written && TextValueRule.MayHoldForbidden(written))
                {
                    _ = TextValueRule.Checked(Decode(written), options.ControlCharacters, ref replaced, out var problem)
                        ?? throw new DataException(path, null, variable.Name, $"row {row}: {problem}");
                }
                continue;
            }
            if (!variable.IsNumeric)
            {
                // Trailing blanks and control characters: the rule of every reader (TextValueRule). Its length limit needs no
                // look: a character variable holds at most 32,767 bytes (the namestr's length is a 16-bit signed number).
                var text = TextValueRule.Unpadded(value);
                if (text.IsEmpty)
                {
                    builder.AddMissing();
                    continue;
                }
                if (TextValueRule.MayHoldForbidden(text))
                {
                    builder.AddText(TextValueRule.Checked(Decode(text), options.ControlCharacters, ref replaced, out var problem)
                        ?? throw new DataException(path, null, variable.Name, $"row {row}: {problem}"));
                    continue;
                }
                builder.AddText(text, DecodeText);
                continue;
            }
            if (IbmFloat.IsMissing(value, out var letter))
            {
                builder.AddMissing(letter);
                continue;
            }
            // No number check is needed here (UnusableNumber): an IBM float has no NaN or infinity, and its largest
            // magnitude, just under 16^63 (about 7.2e75), is below the 1e100 OutputForge reads (IbmFloat).
            var number = IbmFloat.ToDouble(value);
            switch (variable.Temporal)
            {
                case TemporalKind.None:
                    builder.AddNumber(number);
                    break;
                case TemporalKind.Date:
                    builder.AddDay(DayNumber(number, row, variable, path));
                    break;
                case TemporalKind.DateTime:
                    builder.AddText(DateTimeText(number, row, variable, path));
                    break;
                default:
                    builder.AddText(TimeText(number));
                    break;
            }
        }
        return replaced;
    }

    private static readonly TypedColumnBuilder.Decoder DecodeText = Decode;

    /// <summary>Character values are decoded as UTF-8 when they are valid UTF-8, else as Latin-1 (older files).</summary>
    private static string Decode(ReadOnlySpan<byte> text)
    {
        if (System.Text.Ascii.IsValid(text)) return Encoding.ASCII.GetString(text);
        try
        {
            return StrictUtf8.GetString(text);
        }
        catch (DecoderFallbackException)
        {
            return Encoding.Latin1.GetString(text);
        }
    }

    private static int DayNumber(double days, int row, XptVariable variable, string path)
    {
        var whole = Math.Floor(days);
        var day = Epoch.DayNumber + whole;
        if (day < DateOnly.MinValue.DayNumber || day > DateOnly.MaxValue.DayNumber)
        {
            throw new DataException(path, null, variable.Name,
                FormattableString.Invariant($"row {row}: the date value {days} (days from 1960-01-01, format {variable.DisplayFormat}) is outside the years 1 to 9999"));
        }
        return (int)day;
    }

    private static string DateTimeText(double seconds, int row, XptVariable variable, string path)
    {
        var start = Epoch.ToDateTime(TimeOnly.MinValue);
        var ticks = Math.Round(seconds * TimeSpan.TicksPerSecond);
        if (ticks < (DateTime.MinValue - start).Ticks || ticks > (DateTime.MaxValue - start).Ticks)
        {
            throw new DataException(path, null, variable.Name,
                FormattableString.Invariant($"row {row}: the datetime value {seconds} (seconds from 1960-01-01T00:00:00, format {variable.DisplayFormat}) is outside the years 1 to 9999"));
        }
        return start.AddTicks((long)ticks).ToString("yyyy-MM-dd'T'HH:mm:ss.FFFFFFF", CultureInfo.InvariantCulture).TrimEnd('.');
    }

    /// <summary>hh:mm:ss with hours beyond 23 kept (a duration-like time), a fraction of a second only when present.</summary>
    private static string TimeText(double seconds)
    {
        var negative = seconds < 0;
        var total = Math.Abs(seconds);
        var whole = Math.Floor(total);
        var hours = Math.Floor(whole / 3600);
        var minutes = Math.Floor((whole - hours * 3600) / 60);
        var rest = total - hours * 3600 - minutes * 60;
        var secondsText = rest == Math.Floor(rest)
            ? ((int)rest).ToString("00", CultureInfo.InvariantCulture)
            : rest.ToString("00.#######", CultureInfo.InvariantCulture);
        return FormattableString.Invariant($"{(negative ? "-" : "")}{hours:00}:{minutes:00}:{secondsText}");
    }

    private static void Expect(RecordInput input, ReadOnlySpan<byte> record, string header, string what)
    {
        if (!StartsWith(record, header))
        {
            throw new DataException(input.Path, null, null, $"record {input.Record}: expected {what} (\"{header[..41].TrimEnd('*')}...\"), found \"{Shown(record)}\"");
        }
    }

    private static bool StartsWith(ReadOnlySpan<byte> record, string text)
    {
        if (record.Length < text.Length) return false;
        for (var i = 0; i < text.Length; i++)
        {
            if (record[i] != text[i]) return false;
        }
        return true;
    }

    private static int? ParseDigits(ReadOnlySpan<byte> field)
    {
        var value = 0;
        foreach (var b in field)
        {
            if ((uint)(b - '0') > 9) return null;
            value = value * 10 + (b - '0');
        }
        return value;
    }

    /// <summary>The start of a record as printable text, for messages.</summary>
    private static string Shown(ReadOnlySpan<byte> record)
    {
        var text = new StringBuilder();
        foreach (var b in record[..Math.Min(record.Length, 48)])
        {
            text.Append(b is >= 0x20 and < 0x7F ? (char)b : '?');
        }
        return text.ToString().TrimEnd() + (record.Length > 48 ? "..." : "");
    }

    /// <summary>The file as consecutive 80-byte records.</summary>
    private sealed class RecordInput(FileStream stream, string path)
    {
        private readonly byte[] _record = new byte[RecordLength];

        public string Path => path;

        /// <summary>The number (1-based) of the record last read.</summary>
        public long Record { get; private set; }

        public long Position => stream.Position;

        public Microsoft.Win32.SafeHandles.SafeFileHandle Handle => stream.SafeFileHandle;

        public ReadOnlySpan<byte> Next(string what)
        {
            var read = stream.ReadAtLeast(_record, RecordLength, throwOnEndOfStream: false);
            Record++;
            if (read < RecordLength)
            {
                throw new DataException(path, null, null, read == 0
                    ? $"record {Record}: the file ends where {what} should be; is it truncated, or not an XPT transport file?"
                    : $"record {Record}: the file ends inside {what} ({read} of 80 bytes); is it truncated?");
            }
            return _record;
        }

        /// <summary>Goes on from <paramref name="position"/>, the start of a record.</summary>
        public void Seek(long position)
        {
            stream.Position = position;
            Record = position / RecordLength;
        }

        public void Fill(Span<byte> buffer)
        {
            stream.ReadExactly(buffer);
            Record += buffer.Length / RecordLength;
        }
    }
}
