using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using OutputForge.Expressions;

namespace OutputForge.Data.Xpt;

/// <summary>
/// Writes a dataset as an XPT version 5 transport file of one member (the layout <see cref="XptDatasetReader"/>
/// reads): numbers as 8-byte IBM floating point, dates as day counts from 1960-01-01 with the display format DATE9.,
/// text as blank-padded UTF-8 of the column's longest value (at most 200 bytes, the format's limit). The header's
/// creation time is given, so the same data gives the same bytes.
/// </summary>
public static class XptDatasetWriter
{
    public const int MaxTextBytes = 200;

    private static readonly DateOnly Epoch = new(1960, 1, 1);

    // The published version 5 transport layout fixes the first 24 bytes of the library header record and the
    // first 8 and the third 8 bytes of the member header record: they identify the file type, are not ours to
    // choose, and readers check them (pandas 1.5.3's xport reader refuses a file without the library prefix,
    // "Header record has invalid prefix"). The version field beside them is written as the layout's examples give it.
    private const string LibraryHeaderPrefix = "SAS     SAS     SASLIB  ";
    private const string MemberHeaderPrefix = "SAS     ";
    private const string MemberHeaderKind = "SASDATA ";
    private const string LayoutVersion = "9.4     ";

    public static void Write(Dataset dataset, string path, DateTime created)
    {
        var name = dataset.Name.ToUpperInvariant();
        if (name.Length > 8) throw new ArgumentException($"dataset name {name} is longer than the 8 characters of the transport format");
        var columns = dataset.Columns;
        var lengths = new int[columns.Count];
        var positions = new int[columns.Count];
        var rowLength = 0;
        for (var c = 0; c < columns.Count; c++)
        {
            var column = columns[c];
            if (column.Name.Length > 8) throw new ArgumentException($"variable name {column.Name} is longer than the 8 characters of the transport format");
            lengths[c] = column.Kind == VariableKind.Text ? Math.Max(1, MaxBytes(column)) : 8;
            if (lengths[c] > MaxTextBytes) throw new ArgumentException($"variable {column.Name} holds a value of {lengths[c]} bytes, more than the {MaxTextBytes} of the transport format");
            positions[c] = rowLength;
            rowLength += lengths[c];
        }
        using var stream = new FileStream(path, FileMode.Create, FileAccess.Write, FileShare.None, 1 << 16);
        var stamp = created.ToString("ddMMMyy:HH:mm:ss", CultureInfo.InvariantCulture).ToUpperInvariant();
        Record(stream, "HEADER RECORD*******LIBRARY HEADER RECORD!!!!!!!000000000000000000000000000000  ");
        Record(stream, LibraryHeaderPrefix + LayoutVersion + Field("OUTFORGE", 8) + Field("", 24) + stamp);
        Record(stream, stamp);
        Record(stream, "HEADER RECORD*******MEMBER  HEADER RECORD!!!!!!!000000000000000001600000000140  ");
        Record(stream, "HEADER RECORD*******DSCRPTR HEADER RECORD!!!!!!!000000000000000000000000000000  ");
        Record(stream, MemberHeaderPrefix + Field(name, 8) + MemberHeaderKind + LayoutVersion + Field("OUTFORGE", 8) + Field("", 24) + stamp);
        Record(stream, stamp + Field("", 16) + Field(Ascii(dataset.Label ?? ""), 40) + Field("", 8));
        Record(stream, FormattableString.Invariant($"HEADER RECORD*******NAMESTR HEADER RECORD!!!!!!!000000{columns.Count:0000}00000000000000000000  "));
        var namestrs = new byte[(columns.Count * XptVariable.RecordLength + 79) / 80 * 80];
        namestrs.AsSpan().Fill((byte)' ');
        for (var c = 0; c < columns.Count; c++)
        {
            var record = namestrs.AsSpan(c * XptVariable.RecordLength, XptVariable.RecordLength);
            record.Clear();
            var column = columns[c];
            BinaryPrimitives.WriteInt16BigEndian(record, (short)(column.Kind == VariableKind.Text ? 2 : 1));
            BinaryPrimitives.WriteInt16BigEndian(record[4..], (short)lengths[c]);
            BinaryPrimitives.WriteInt16BigEndian(record[6..], (short)(c + 1));
            Encoding.ASCII.GetBytes(Field(column.Name.ToUpperInvariant(), 8), record.Slice(8, 8));
            Encoding.ASCII.GetBytes(Field(Ascii(column.Label ?? ""), 40), record.Slice(16, 40));
            Encoding.ASCII.GetBytes(Field(column.Kind == VariableKind.Date ? "DATE" : "", 8), record.Slice(56, 8));
            BinaryPrimitives.WriteInt16BigEndian(record[64..], (short)(column.Kind == VariableKind.Date ? 9 : 0));
            Encoding.ASCII.GetBytes(Field("", 8), record.Slice(72, 8));
            BinaryPrimitives.WriteInt32BigEndian(record[84..], positions[c]);
        }
        stream.Write(namestrs);
        Record(stream, "HEADER RECORD*******OBS     HEADER RECORD!!!!!!!000000000000000000000000000000  ");
        var row = new byte[rowLength];
        long written = 0;
        for (var r = 0; r < dataset.RowCount; r++)
        {
            row.AsSpan().Fill((byte)' ');
            for (var c = 0; c < columns.Count; c++)
            {
                var column = columns[c];
                var cell = row.AsSpan(positions[c], lengths[c]);
                if (column.Kind == VariableKind.Text)
                {
                    if (column.GetText(r) is { } text) Encoding.UTF8.GetBytes(text, cell);
                    continue;
                }
                var value = column.IsMissing(r) ? double.NaN : column.GetNumber(r);
                if (column.Kind == VariableKind.Date && !double.IsNaN(value)) value -= Epoch.DayNumber;
                IbmFloat.Write(value, cell);
            }
            stream.Write(row);
            written += rowLength;
        }
        var padding = (int)((80 - written % 80) % 80);
        stream.Write(Enumerable.Repeat((byte)' ', padding).ToArray());
    }

    private static int MaxBytes(DataColumn column)
    {
        var max = 0;
        foreach (var value in column.DistinctValues())
        {
            max = Math.Max(max, Encoding.UTF8.GetByteCount(value));
        }
        return max;
    }

    /// <summary>Header fields hold ASCII only: other characters become '?'.</summary>
    private static string Ascii(string text) => new(text.Select(c => c is >= ' ' and < (char)0x7F ? c : '?').ToArray());

    private static string Field(string text, int width) => text.Length >= width ? text[..width] : text.PadRight(width);

    private static void Record(Stream stream, string text)
    {
        if (text.Length != 80) text = Field(text, 80);
        stream.Write(Encoding.ASCII.GetBytes(text));
    }
}
