using System.Text;

namespace OutputForge.Demo;

/// <summary>
/// Writes one CSV file as RFC 4180 describes it: comma-separated, a field quoted (with inner quotes
/// doubled) only when it holds a comma, quote or line break. UTF-8 without byte-order mark and "\n"
/// line endings on every platform, so that the same rows give the same bytes everywhere.
/// A missing value is an empty field.
/// </summary>
internal sealed class CsvTableWriter : IDisposable
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);
    private readonly StreamWriter _writer;
    private readonly int _columnCount;
    private int _fieldInRow;

    public CsvTableWriter(string path, IReadOnlyList<string> header)
    {
        _writer = new StreamWriter(path, append: false, Utf8NoBom, bufferSize: 1 << 16) { NewLine = "\n" };
        _columnCount = header.Count;
        foreach (var name in header) Field(name);
        EndRow();
    }

    public CsvTableWriter Field(string? value)
    {
        if (_fieldInRow > 0) _writer.Write(',');
        _fieldInRow++;
        if (string.IsNullOrEmpty(value)) return this;
        if (value.AsSpan().IndexOfAny(",\"\r\n") < 0)
        {
            _writer.Write(value);
            return this;
        }
        _writer.Write('"');
        _writer.Write(value.Replace("\"", "\"\""));
        _writer.Write('"');
        return this;
    }

    public CsvTableWriter Field(int? value) => Field(value?.ToString(System.Globalization.CultureInfo.InvariantCulture));

    public void EndRow()
    {
        if (_fieldInRow != _columnCount)
            throw new InvalidOperationException($"CSV row has {_fieldInRow} fields, the header has {_columnCount}.");
        _writer.Write('\n');
        _fieldInRow = 0;
    }

    public void Dispose() => _writer.Dispose();
}
