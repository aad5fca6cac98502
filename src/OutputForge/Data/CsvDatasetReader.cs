using System.Globalization;
using System.Text;
using CsvHelper;
using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// Reads one ADaM-style CSV file (a header row of variable names, RFC 4180 quoting, UTF-8) into a
/// <see cref="Dataset"/> with typed columns. Every problem is a <see cref="DataException"/> naming
/// the file, line and variable.
/// </summary>
public static class CsvDatasetReader
{
    public static Dataset Read(string name, string path)
    {
        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new DataException(path, null, null, $"cannot read the file ({e.Message})");
        }
        var bodyStart = CheckEncoding(path, bytes);
        return Parse(name, path, bytes, bodyStart);
    }

    private static int CheckEncoding(string path, byte[] bytes)
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

    private static Dataset Parse(string name, string path, byte[] bytes, int bodyStart)
    {
        var options = new CsvReaderOptions
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
        try
        {
            using var reader = CsvReader.Create(new ReadOnlyMemory<byte>(bytes, bodyStart, bytes.Length - bodyStart), options);
            if (!reader.Read())
            {
                throw new DataException(path, 1, null, "the file has no header row");
            }
            var header = Fields(reader);
            CheckHeader(path, header);
            var values = header.Select(_ => new List<string?>()).ToArray();
            var lines = new List<int>();
            while (reader.Read())
            {
                var line = (int)reader.LineNumber;
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
                    values[c].Add(reader.IsEmpty(c) ? null : reader.GetString(c));
                }
                lines.Add(line);
            }
            var columns = new List<DataColumn>(header.Length);
            for (var c = 0; c < header.Length; c++)
            {
                columns.Add(TypeColumn(header[c], values[c].ToArray()));
            }
            return new Dataset(name, path, lines.Count, columns, lines);
        }
        catch (CsvFormatException e)
        {
            throw new DataException(path, e.LineNumber > 0 ? (int)e.LineNumber : null, null, DescribeMalformed(e.Message));
        }
    }

    private static string[] Fields(CsvReader reader)
    {
        var fields = new string[reader.FieldCount];
        for (var c = 0; c < fields.Length; c++)
        {
            fields[c] = reader.GetString(c).Trim();
        }
        return fields;
    }

    /// <summary>Keeps the reader's own description of the fault, without the record and byte positions we report ourselves.</summary>
    private static string DescribeMalformed(string message)
    {
        var text = System.Text.RegularExpressions.Regex.Replace(message, @"^.*?\(line \d+\):\s*", string.Empty);
        text = System.Text.RegularExpressions.Regex.Replace(text, @"\s*\(byte offset \d+\)", string.Empty).TrimEnd('.');
        return $"malformed CSV: {text} (RFC 4180 quoting expected)";
    }

    private static void CheckHeader(string path, string[] header)
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

    /// <summary>
    /// A column is numeric when every non-missing value reads as an invariant-culture number, a
    /// date when every non-missing value is an ISO 8601 date (YYYY-MM-DD), and text otherwise.
    /// </summary>
    private static DataColumn TypeColumn(string name, string?[] text)
    {
        var numbers = new double[text.Length];
        var numeric = true;
        var dates = true;
        var any = false;
        for (var i = 0; i < text.Length && (numeric || dates); i++)
        {
            var value = text[i];
            if (value is null)
            {
                numbers[i] = double.NaN;
                continue;
            }
            any = true;
            if (numeric)
            {
                if (double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out var number) && double.IsFinite(number))
                {
                    numbers[i] = number;
                }
                else
                {
                    numeric = false;
                }
            }
            if (dates && !(value.Length == 10 && DateOnly.TryParseExact(value, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _)))
            {
                dates = false;
            }
        }
        if (!any)
        {
            return new DataColumn(name, VariableKind.Text, text, null);
        }
        if (numeric)
        {
            return new DataColumn(name, VariableKind.Number, text, numbers);
        }
        if (dates)
        {
            for (var i = 0; i < text.Length; i++)
            {
                numbers[i] = text[i] is null ? double.NaN
                    : DateOnly.ParseExact(text[i]!, "yyyy-MM-dd", CultureInfo.InvariantCulture).DayNumber;
            }
            return new DataColumn(name, VariableKind.Date, text, numbers);
        }
        return new DataColumn(name, VariableKind.Text, text, null);
    }
}
