using System.Security.Cryptography;
using System.Text.Unicode;
using CsvHelper;

namespace OutputForge.Data;

/// <summary>
/// One CSV file read in parts on several cores. A large file (a BDS dataset of millions of records) is cut into parts
/// of about <see cref="PartBytes"/> at line feeds, and each part is parsed into its own region of the columns
/// (<see cref="ColumnStore"/>), typed as it is read; the parts are then joined as if one reader had read the file
/// (<see cref="ColumnBuilder.Join"/>). A cut inside a quoted value (one holding a line break) leaves the part before it
/// ending in an open quote, which its reader refuses; whenever any part fails, for that reason or because the file is
/// bad, the whole file is read again from the start on one thread (<see cref="CsvDatasetReader.ReadWhole"/>), so a
/// problem is reported exactly as a reader going through the file would report it: the first one, at its line.
/// </summary>
public sealed class CsvFileParts
{
    /// <summary>The size of a part: large enough that the parts' own costs (a reader each, the join) are small.</summary>
    public const int PartBytes = 32 << 20;

    private readonly string _name;
    private readonly string _path;
    private readonly byte[] _bytes;
    private readonly DataReadOptions _options;
    private readonly Task<string> _digest;
    private readonly int[] _starts;
    private readonly string[]? _header;
    private readonly ColumnBuilder?[][] _columns = [];
    private readonly SkippedColumnProbe?[][] _probes = [];
    private readonly int[] _lines = [];
    private readonly int[] _rowOffsets = [];
    private readonly int[] _lineOffsets = [];
    private readonly (int Rows, int Replaced)[] _read = [];
    private readonly bool[] _failed = [];
    private Dataset? _whole;
    private Exception? _wholeError;
    private readonly List<string> _wholeWarnings = [];

    private CsvFileParts(string name, string path, byte[] bytes, DataReadOptions options, int partBytes)
    {
        _name = name;
        _path = path;
        _bytes = bytes;
        _options = options;
        // The manifest names the bytes that were parsed: their SHA-256 is computed beside the parsing, instead of
        // reading the file a second time afterwards.
        _digest = Task.Run(() => Convert.ToHexStringLower(SHA256.HashData(bytes)));
        _starts = [0];
        var bodyStart = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
        if (Environment.ProcessorCount == 1 || bytes.Length - bodyStart < 2L * partBytes || HeaderOf(bytes, bodyStart) is not { } header)
        {
            return;
        }
        _header = header;
        _starts = Cuts(bytes, bodyStart, partBytes);
        var count = _starts.Length;
        var breaks = new int[count];
        var bounds = new int[count];
        Parallel.For(0, count, p =>
        {
            var span = bytes.AsSpan(_starts[p], End(p) - _starts[p]);
            breaks[p] = LineBreaks.Count(span);
            bounds[p] = LineBreaks.Bound(span);
        });
        _rowOffsets = new int[count];
        _lineOffsets = new int[count];
        for (var p = 1; p < count; p++)
        {
            _rowOffsets[p] = _rowOffsets[p - 1] + bounds[p - 1];
            _lineOffsets[p] = _lineOffsets[p - 1] + breaks[p - 1];
        }
        var capacity = _rowOffsets[^1] + bounds[^1];
        var keep = options.KeepOf(name);
        var stores = header.Select(h => keep is null || keep(h) ? new ColumnStore(capacity) : null).ToArray();
        _columns = Enumerable.Range(0, count)
            .Select(p => header.Select((h, c) => stores[c] is { } store ? new ColumnBuilder(h, store, _rowOffsets[p]) : null).ToArray())
            .ToArray();
        _probes = Enumerable.Range(0, count)
            .Select(p => header.Select((h, c) => stores[c] is null ? new SkippedColumnProbe() : null).ToArray())
            .ToArray();
        _lines = new int[capacity];
        _read = new (int, int)[count];
        _failed = new bool[count];
    }

    /// <summary>The parts to <see cref="Read"/>, each on any thread; one for a file read whole.</summary>
    public int Count => _starts.Length;

    /// <summary>The bytes of part <paramref name="part"/> (to take the larger parts first).</summary>
    public long BytesOf(int part) => End(part) - _starts[part];

    /// <summary>Reads the file's bytes and plans its parts (the file is read whole below 2 parts' worth).</summary>
    public static CsvFileParts Open(string name, string path, DataReadOptions options, int partBytes = PartBytes)
    {
        byte[] bytes;
        try
        {
            bytes = Files.RegularFile.ReadAllBytes(path, Files.RegularFile.SizeLimit, Files.RegularFile.SizeLimitReason, problem => new DataException(path, null, null, problem));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new DataException(path, null, null, $"cannot read the file ({e.Message})");
        }
        return new CsvFileParts(name, path, bytes, options, partBytes);
    }

    /// <summary>Reads one part; its problems are kept for <see cref="Finish"/>.</summary>
    public void Read(int part)
    {
        if (_header is null)
        {
            try
            {
                _whole = CsvDatasetReader.ReadWhole(_name, _path, _bytes, _options, _wholeWarnings.Add);
            }
            catch (Exception e)
            {
                _wholeError = e;
            }
            return;
        }
        var start = _starts[part];
        var bytes = new ReadOnlyMemory<byte>(_bytes, start, End(part) - start);
        try
        {
            // The checks a reader from the start makes on the whole file first, made on this part's bytes: a part
            // begins after a line feed, so at a character boundary.
            if (bytes.Span.IndexOf((byte)0) >= 0 || !Utf8.IsValid(bytes.Span))
            {
                _failed[part] = true;
                return;
            }
            using var reader = CsvReader.Create(bytes, CsvDatasetReader.ReaderOptions());
            if (part == 0 && !reader.Read())
            {
                _failed[part] = true;
                return;
            }
            _read[part] = CsvDatasetReader.ReadRecords(reader, _path, _header, _columns[part], _lines, _rowOffsets[part],
                _lineOffsets[part], _options, _probes[part]);
        }
        catch (Exception)
        {
            // Whatever the reason (a bad value, or a cut inside a quoted value), the whole file is read again in Finish.
            _failed[part] = true;
        }
    }

    /// <summary>
    /// The dataset, once every part is read; a <see cref="DataException"/> for the file's first problem. Warnings go
    /// to <paramref name="warn"/>.
    /// </summary>
    public Dataset Finish(Action<string> warn)
    {
        var dataset = Join(warn);
        dataset.ContentSha256 = _digest.GetAwaiter().GetResult();
        return dataset;
    }

    private Dataset Join(Action<string> warn)
    {
        if (_header is null)
        {
            _wholeWarnings.ForEach(warn);
            if (_wholeError is not null)
            {
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(_wholeError).Throw();
            }
            return _whole!;
        }
        if (_failed.Any(f => f))
        {
            return CsvDatasetReader.ReadWhole(_name, _path, _bytes, _options, warn);
        }
        var replaced = _read.Sum(r => r.Replaced);
        if (replaced > 0)
        {
            warn(CsvDatasetReader.ReplacedWarning(_path, replaced));
        }
        var kept = Enumerable.Range(0, _header.Length).Where(c => _columns[0][c] is not null).ToArray();
        var columns = new DataColumn[kept.Length];
        // Errors by column, skipped variables included (a number no statistic can use is refused whatever a run reads).
        var errors = Enumerable.Range(0, _header.Length)
            .Select(c => _columns[0][c] is null ? SkippedColumnProbe.Problem(_probes.Select(part => part[c]!).ToList(), _path, _header[c]) : null)
            .ToArray();
        Parallel.For(0, kept.Length, k =>
        {
            try
            {
                columns[k] = ColumnBuilder.Join(_columns.Select(part => part[kept[k]]!).ToList(), _path);
            }
            catch (DataException e)
            {
                errors[kept[k]] = e;
            }
        });
        // An unusable number: the one on the earliest line (then the leftmost column), as a reader from the start finds it.
        if (errors.Where(e => e is not null).OrderBy(e => e!.Line).FirstOrDefault() is { } first)
        {
            throw first;
        }
        var rows = _read.Sum(r => r.Rows);
        ColumnBuilder.MoveRowsTogether(_read.Select(r => r.Rows).ToList(), _rowOffsets, _lines);
        return new Dataset(_name, _path, rows, columns, new ArraySegment<int>(_lines, 0, rows)) { VariableNames = _header };
    }

    private int End(int part) => part + 1 < _starts.Length ? _starts[part + 1] : _bytes.Length;

    /// <summary>The header's variable names, or null when the header is not plain (the whole file is then read at once, which reports why).</summary>
    private static string[]? HeaderOf(byte[] bytes, int bodyStart)
    {
        try
        {
            using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(bytes, bodyStart, bytes.Length - bodyStart), CsvDatasetReader.ReaderOptions());
            if (!reader.Read())
            {
                return null;
            }
            var header = CsvDatasetReader.Fields(reader);
            CsvDatasetReader.CheckHeader("", header);
            return header;
        }
        catch (Exception)
        {
            return null;
        }
    }

    /// <summary>Where the parts start: the first at the file's body, the others just after a line feed near each multiple of the part size.</summary>
    private static int[] Cuts(byte[] bytes, int bodyStart, int partBytes)
    {
        var count = (int)Math.Ceiling((bytes.Length - bodyStart) / (double)partBytes);
        var starts = new List<int> { bodyStart };
        for (var p = 1; p < count; p++)
        {
            var target = bodyStart + (long)(bytes.Length - bodyStart) * p / count;
            if (target <= starts[^1])
            {
                continue;
            }
            var feed = Array.IndexOf(bytes, (byte)'\n', (int)target);
            if (feed < 0 || feed + 1 >= bytes.Length)
            {
                break;
            }
            starts.Add(feed + 1);
        }
        return [.. starts];
    }
}
