using System.Text;

namespace OutputForge.Tests.Support;

/// <summary>
/// A deliberately separate, minimal RFC 4180 reader for tests, so that end-to-end checks recompute
/// numbers from the CSV without going through OutputForge's own data layer.
/// </summary>
public static class SimpleCsv
{
    public static List<Dictionary<string, string>> Read(string path)
    {
        var records = Split(File.ReadAllText(path));
        var header = records[0];
        return records.Skip(1)
            .Where(r => r.Count == header.Count)
            .Select(r => header.Select((h, i) => (h, r[i])).ToDictionary(p => p.h, p => p.Item2))
            .ToList();
    }

    private static List<List<string>> Split(string text)
    {
        var records = new List<List<string>>();
        var record = new List<string>();
        var field = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    field.Append('"');
                    i++;
                }
                else if (c == '"')
                {
                    quoted = false;
                }
                else
                {
                    field.Append(c);
                }
                continue;
            }
            switch (c)
            {
                case '"':
                    quoted = true;
                    break;
                case ',':
                    record.Add(field.ToString());
                    field.Clear();
                    break;
                case '\r':
                    break;
                case '\n':
                    record.Add(field.ToString());
                    field.Clear();
                    records.Add(record);
                    record = [];
                    break;
                default:
                    field.Append(c);
                    break;
            }
        }
        if (field.Length > 0 || record.Count > 0)
        {
            record.Add(field.ToString());
            records.Add(record);
        }
        return records;
    }
}
