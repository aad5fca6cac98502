using System.Globalization;
using System.Text;
using System.Text.Json;
using OutputForge.Expressions;

namespace OutputForge.Data.DatasetJson;

/// <summary>
/// Writes a dataset as CDISC Dataset-JSON 1.1 (the form <see cref="DatasetJsonReader"/> reads), as one JSON object
/// or, with <c>ndjson</c>, as NDJSON (the metadata on the first line, one row per line). Column types: text is
/// "string" (length: its longest value); a number column whose values are all whole numbers is "integer", any
/// other "decimal", written as strings holding the value's text, so its decimals are kept; dates are "date" (ISO
/// 8601, target type integer, display format DATE9.). The creation time is given, so the same data gives the same bytes.
/// </summary>
public static class DatasetJsonWriter
{
    public static void Write(Dataset dataset, string path, DateTime created, bool ndjson = false)
    {
        var columns = dataset.Columns;
        var integers = columns.Select(IsInteger).ToArray();
        using var stream = new FileStream(path, FileMode.Create, FileAccess.Write, FileShare.None, 1 << 16);
        var options = new JsonWriterOptions { Indented = false };
        using (var json = new Utf8JsonWriter(stream, options))
        {
            json.WriteStartObject();
            json.WriteString("datasetJSONCreationDateTime", created.ToString("yyyy-MM-dd'T'HH:mm:ss", CultureInfo.InvariantCulture));
            json.WriteString("datasetJSONVersion", "1.1.0");
            json.WriteString("itemGroupOID", "IG." + dataset.Name.ToUpperInvariant());
            json.WriteNumber("records", dataset.RowCount);
            json.WriteString("name", dataset.Name.ToUpperInvariant());
            json.WriteString("label", dataset.Label ?? dataset.Name.ToUpperInvariant());
            json.WriteStartArray("columns");
            for (var c = 0; c < columns.Count; c++)
            {
                var column = columns[c];
                json.WriteStartObject();
                json.WriteString("itemOID", $"IT.{dataset.Name.ToUpperInvariant()}.{column.Name}");
                json.WriteString("name", column.Name);
                json.WriteString("label", column.Label ?? column.Name);
                switch (column.Kind)
                {
                    case VariableKind.Text:
                        json.WriteString("dataType", "string");
                        json.WriteNumber("length", Math.Max(1, column.DistinctValues().Select(v => v.Length).DefaultIfEmpty(0).Max()));
                        break;
                    case VariableKind.Date:
                        json.WriteString("dataType", "date");
                        json.WriteString("targetDataType", "integer");
                        json.WriteString("displayFormat", "DATE9.");
                        break;
                    default:
                        json.WriteString("dataType", integers[c] ? "integer" : "decimal");
                        break;
                }
                json.WriteEndObject();
            }
            json.WriteEndArray();
            if (ndjson)
            {
                json.WriteEndObject();
                EndLine(json, stream);
            }
            else
            {
                json.WriteStartArray("rows");
            }
            for (var row = 0; row < dataset.RowCount; row++)
            {
                json.WriteStartArray();
                for (var c = 0; c < columns.Count; c++)
                {
                    var column = columns[c];
                    var text = column.GetText(row);
                    if (text is null)
                    {
                        json.WriteNullValue();
                    }
                    else if (column.Kind != VariableKind.Number || !integers[c])
                    {
                        json.WriteStringValue(text);
                    }
                    else if (CanonicalText.TryParseNumber(Encoding.UTF8.GetBytes(text), out _, out _))
                    {
                        json.WriteRawValue(text, skipInputValidation: true);
                    }
                    else
                    {
                        json.WriteNumberValue(column.GetNumber(row));
                    }
                }
                json.WriteEndArray();
                if (ndjson)
                {
                    EndLine(json, stream);
                }
            }
            if (!ndjson)
            {
                json.WriteEndArray();
                json.WriteEndObject();
            }
        }
    }

    /// <summary>Ends an NDJSON line: each line is a JSON value of its own, so the writer starts afresh after it.</summary>
    private static void EndLine(Utf8JsonWriter json, Stream stream)
    {
        json.Flush();
        stream.WriteByte((byte)'\n');
        json.Reset(stream);
    }

    private static bool IsInteger(DataColumn column)
    {
        if (column.Kind != VariableKind.Number) return false;
        for (var row = 0; row < column.Length; row++)
        {
            var value = column.GetNumber(row);
            if (!double.IsNaN(value) && (value != Math.Floor(value) || Math.Abs(value) >= 1e15)) return false;
        }
        return true;
    }
}
