using System.Text.Json;
using Microsoft.Win32.SafeHandles;
using OutputForge.Common;

namespace OutputForge.Data.DatasetJson;

/// <summary>
/// The rows of a large Dataset-JSON file read in parts on several cores, each part streamed from its own place in the
/// file. The metadata before <c>rows</c> is read first, front to back; the rows' bytes are then cut into parts of about
/// <see cref="PartBytes"/>, each starting at what looks like the start of a row (a '[' after "]," outside the
/// metadata); each part reads whole rows, one JSON value at a time, until it reaches the next part's start. A guess
/// that was not a row start (the bytes "],[" inside a text value) is found out, because the part before it then does
/// not end exactly there; that, any error and any warning sends the whole file to the ordinary front-to-back reading
/// (null is returned), so problems are reported exactly as a reader going through the file reports them.
/// </summary>
internal static class DatasetJsonRowParts
{
    public const int PartBytes = 32 << 20;

    private const int BlockBytes = 1 << 20;

    /// <summary>The parser holding the whole dataset, or null when the file must be read front to back.</summary>
    public static DatasetJsonReader.Parser? TryRead(string path, DataReadOptions options, long size, int partBytes = PartBytes,
        Func<string, bool>? keep = null)
    {
        DatasetJsonReader.PumpResult head;
        try
        {
            head = DatasetJsonReader.Pump(path, ndjson: false, options, size, stopAtRows: true, keep: keep);
        }
        catch (DataException)
        {
            return null;
        }
        if (!head.StoppedAtRows || size - head.RowsStart < 2L * partBytes)
        {
            return null;
        }
        using var handle = File.OpenHandle(path, FileMode.Open, FileAccess.Read, FileShare.Read, FileOptions.RandomAccess);
        var starts = new List<long> { head.RowsStart };
        var count = (int)Math.Min(Environment.ProcessorCount * 4L, (size - head.RowsStart) / partBytes);
        for (var p = 1; p < count; p++)
        {
            var cut = head.RowsStart + (size - head.RowsStart) * p / count;
            if (NextRowStart(handle, cut, size) is { } start && start > starts[^1])
            {
                starts.Add(start);
            }
        }
        var capacity = (int)Math.Min(int.MaxValue / 2, head.Parser.ColumnList.Count == 0 ? 16 : (size / starts.Count) / (head.Parser.ColumnList.Count * 8) + 16);
        var parts = starts.Select(_ => DatasetJsonReader.Parser.ForRows(head.Parser, capacity)).ToArray();
        var ends = new (long Next, bool EndOfRows, bool Failed)[parts.Length];
        InOrderParallel.For(parts.Length, p =>
        {
            try
            {
                var limit = p + 1 < starts.Count ? starts[p + 1] : long.MaxValue;
                ends[p] = ReadPart(handle, parts[p], starts[p], limit, size, first: p == 0);
            }
            catch (Exception e) when (e is JsonException or DataException)
            {
                ends[p] = (0, false, true);
            }
        });
        for (var p = 0; p < parts.Length; p++)
        {
            var last = p == parts.Length - 1;
            if (ends[p].Failed || parts[p].Warnings.Count > 0 || (last ? !ends[p].EndOfRows : ends[p].EndOfRows || ends[p].Next != starts[p + 1]))
            {
                return null;
            }
        }
        var columns = head.Parser.ColumnList.Count;
        var joined = Enumerable.Range(0, columns)
            .Select(c => parts[0].Builders![c] is null ? null : TypedColumnBuilder.Join(parts.Select(p => p.Builders![c]!).ToList()))
            .ToArray();
        head.Parser.AdoptRows(parts.Sum(p => p.Rows), joined, parts.Sum(p => p.Replaced));
        try
        {
            // The rest of the file after the rows (e.g. "records" written last, and the closing brace), read on from the
            // state at the rows' start: the ']' that ends the rows closes the (now filled) array.
            DatasetJsonReader.Pump(path, ndjson: false, options, size, stopAtRows: false, from: ends[^1].Next, resume: head.State, parser: head.Parser);
        }
        catch (DataException)
        {
            return null;
        }
        return head.Parser;
    }

    /// <summary>The offset of the first '[' at or after <paramref name="from"/> that follows ']' and ',' (with blanks between), or null.</summary>
    private static long? NextRowStart(SafeFileHandle handle, long from, long size)
    {
        var buffer = new byte[BlockBytes];
        for (var offset = from; offset < size && offset < from + 16L * BlockBytes; offset += BlockBytes - 64)
        {
            var read = RandomAccess.Read(handle, buffer, offset);
            for (var i = 0; i < read; i++)
            {
                if (buffer[i] != (byte)']') continue;
                var j = SkipBlanks(buffer, i + 1, read);
                if (j >= read || buffer[j] != (byte)',') continue;
                j = SkipBlanks(buffer, j + 1, read);
                if (j < read && buffer[j] == (byte)'[') return offset + j;
            }
        }
        return null;
    }

    private static int SkipBlanks(byte[] buffer, int i, int end)
    {
        while (i < end && buffer[i] is (byte)' ' or (byte)'\n' or (byte)'\r' or (byte)'\t') i++;
        return i;
    }

    /// <summary>
    /// Reads rows from <paramref name="start"/> (a row's '['; for the first part, just after the rows' '[') until the next
    /// row starts at or after <paramref name="limit"/>, or the rows end (']'). Returns where it stopped: the next row's
    /// start, or the offset of the ']' that ends the rows.
    /// </summary>
    private static (long Next, bool EndOfRows, bool Failed) ReadPart(SafeFileHandle handle, DatasetJsonReader.Parser parser,
        long start, long limit, long size, bool first)
    {
        var buffer = new byte[BlockBytes];
        long bufferStart = start;
        var length = RandomAccess.Read(handle, buffer, start);
        var position = 0;
        var expectComma = false;
        var rowsBefore = parser.Rows;
        while (true)
        {
            // Between rows: blanks, then ',' (after a row), then blanks, then '[' or the rows' closing ']'.
            while (true)
            {
                if (position >= length)
                {
                    if (!Refill(handle, ref buffer, ref bufferStart, ref length, ref position, size)) return (0, false, true);
                    continue;
                }
                var b = buffer[position];
                if (b is (byte)' ' or (byte)'\n' or (byte)'\r' or (byte)'\t')
                {
                    position++;
                    continue;
                }
                if (b == (byte)',' && expectComma)
                {
                    expectComma = false;
                    position++;
                    continue;
                }
                break;
            }
            var at = bufferStart + position;
            if (buffer[position] == (byte)']' && (expectComma || (first && parser.Rows == rowsBefore)))
            {
                return (at, true, false);
            }
            if (buffer[position] != (byte)'[' || expectComma)
            {
                return (0, false, true);
            }
            if (at >= limit)
            {
                return (at, false, false);
            }
            // One row: a JSON array read as a value of its own, across refills if it is cut by the block's end.
            var state = default(JsonReaderState);
            while (true)
            {
                var reader = new Utf8JsonReader(buffer.AsSpan(position, length - position), isFinalBlock: false, state);
                var done = false;
                while (reader.Read())
                {
                    parser.Token(ref reader);
                    if (!parser.InRow)
                    {
                        done = true;
                        break;
                    }
                }
                position += (int)reader.BytesConsumed;
                state = reader.CurrentState;
                if (done) break;
                if (!Refill(handle, ref buffer, ref bufferStart, ref length, ref position, size)) return (0, false, true);
            }
            expectComma = true;
        }
    }

    /// <summary>Keeps the bytes from <paramref name="position"/> and reads more after them; false at the end of the file.</summary>
    private static bool Refill(SafeFileHandle handle, ref byte[] buffer, ref long bufferStart, ref int length, ref int position, long size)
    {
        var kept = length - position;
        Buffer.BlockCopy(buffer, position, buffer, 0, kept);
        bufferStart += position;
        position = 0;
        length = kept;
        if (length == buffer.Length) Array.Resize(ref buffer, buffer.Length * 2);
        if (bufferStart + length >= size) return false;
        length += RandomAccess.Read(handle, buffer.AsSpan(length), bufferStart + length);
        return true;
    }
}
