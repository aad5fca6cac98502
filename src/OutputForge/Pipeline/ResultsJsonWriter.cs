using System.Text.Json;
using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Pipeline;

/// <summary>
/// Writes results.json: the run's facts, one entry per table (titles, population, warnings) and
/// every number of every table as a record (see docs/results.md). Property order is fixed and
/// values are written in their shortest round-trip form, so the file diffs cleanly between runs.
/// </summary>
public static class ResultsJsonWriter
{
    public static void Write(Stream output, string studyId, RunFacts run, IReadOnlyList<(LaidOutTable Table, IReadOnlyList<string> Warnings)> tables)
    {
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        json.WriteStartObject();
        json.WriteString("tool", "OutputForge");
        json.WriteString("version", run.ToolVersion);
        json.WriteString("study", studyId);
        json.WriteString("runTime", run.RunTime.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", System.Globalization.CultureInfo.InvariantCulture));
        json.WriteString("caution", TableLayoutBuilder.Caution);
        json.WriteStartArray("tables");
        foreach (var (table, warnings) in tables)
        {
            var document = table.Document;
            json.WriteStartObject();
            json.WriteString("id", document.TableId);
            json.WriteStartArray("title");
            foreach (var title in document.Titles)
            {
                json.WriteStringValue(title);
            }
            json.WriteEndArray();
            json.WriteString("population", document.Population);
            json.WriteStartArray("warnings");
            foreach (var warning in warnings)
            {
                json.WriteStringValue(warning);
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteStartArray("records");
        foreach (var (table, _) in tables)
        {
            foreach (var record in table.Records)
            {
                WriteRecord(json, record);
            }
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteRecord(Utf8JsonWriter json, ResultRecord record)
    {
        json.WriteStartObject();
        json.WriteString("table", record.Table);
        json.WriteString("row", record.Row);
        json.WriteString("column", record.Column);
        json.WriteString("statistic", record.Statistic);
        if (record.Value is { } value)
        {
            json.WriteNumber("value", value);
        }
        else
        {
            json.WriteNull("value");
        }
        json.WriteString("formatted", record.Formatted);
        json.WriteString("rowLabel", record.RowLabel);
        json.WriteString("columnLabel", record.ColumnLabel);
        if (record.Method is not null)
        {
            json.WriteString("method", record.Method);
        }
        if (record.Note is not null)
        {
            json.WriteString("note", record.Note);
        }
        json.WriteEndObject();
    }
}
