using System.Globalization;
using System.Text;

namespace OutputForge.Tests.Demo;

/// <summary>
/// A CSV file read as header plus string rows by a strict RFC 4180 parser written for the tests
/// (independently of the writer): it rejects stray quotes, carriage returns and a missing final newline.
/// </summary>
public sealed class CsvTable
{
    public IReadOnlyList<string> Header { get; }
    public IReadOnlyList<string[]> Rows { get; }
    private readonly Dictionary<string, int> _index;

    private CsvTable(IReadOnlyList<string> header, IReadOnlyList<string[]> rows)
    {
        Header = header;
        Rows = rows;
        _index = header.Select((name, i) => (name, i)).ToDictionary(p => p.name, p => p.i, StringComparer.Ordinal);
    }

    public static CsvTable Read(string path)
    {
        var text = File.ReadAllText(path, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true));
        if (!text.EndsWith('\n')) throw new FormatException($"{path}: the last line has no newline");
        var records = new List<string[]>();
        var fields = new List<string>();
        var field = new StringBuilder();
        var i = 0;
        while (i < text.Length)
        {
            if (text[i] == '"')
            {
                i++;
                while (true)
                {
                    if (i >= text.Length) throw new FormatException($"{path}: unterminated quoted field");
                    if (text[i] == '"')
                    {
                        if (i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i += 2; continue; }
                        i++;
                        break;
                    }
                    field.Append(text[i++]);
                }
                if (text[i] != ',' && text[i] != '\n') throw new FormatException($"{path}: text after a closing quote at offset {i}");
            }
            else
            {
                while (text[i] != ',' && text[i] != '\n')
                {
                    if (text[i] is '"' or '\r') throw new FormatException($"{path}: quote or carriage return inside an unquoted field at offset {i}");
                    field.Append(text[i++]);
                }
            }

            fields.Add(field.ToString());
            field.Clear();
            if (text[i] == '\n')
            {
                records.Add(fields.ToArray());
                fields.Clear();
            }
            i++;
        }
        return new CsvTable(records[0], records.Skip(1).ToList());
    }

    public string Get(string[] row, string column) => row[_index[column]];

    public IEnumerable<string> Column(string column) => Rows.Select(r => Get(r, column));

    public static DateOnly Date(string text) => DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);

    public static decimal Number(string text) => decimal.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}
