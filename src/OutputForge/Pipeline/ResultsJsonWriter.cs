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
    /// <param name="kept">When only some tables were produced: the existing entries of the others, written back in <paramref name="tableOrder"/>.</param>
    /// <param name="tableOrder">Every table id of the package, in package order (needed with <paramref name="kept"/>).</param>
    public static void Write(Stream output, string studyId, RunFacts run, IReadOnlyList<(LaidOutTable Table, IReadOnlyList<string> Warnings)> tables,
        KeptResults? kept = null, IReadOnlyList<string>? tableOrder = null)
    {
        var produced = tables.ToDictionary(t => t.Table.Document.TableId, StringComparer.Ordinal);
        RefuseAmbiguousKeys(tables);
        var order = kept is null || tableOrder is null ? produced.Keys.ToList() : tableOrder;
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        json.WriteStartObject();
        json.WriteString("tool", "OutputForge");
        json.WriteString("version", run.ToolVersion);
        json.WriteString("study", studyId);
        json.WriteString("runTime", run.RunTime.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", System.Globalization.CultureInfo.InvariantCulture));
        json.WriteString("caution", TableLayoutBuilder.Caution);
        json.WriteNumber("keyScheme", ResultKey.Scheme);
        json.WriteStartArray("tables");
        foreach (var id in order)
        {
            if (!produced.TryGetValue(id, out var entry))
            {
                if (kept is not null && kept.Tables.TryGetValue(id, out var keptTable))
                {
                    keptTable.WriteTo(json);
                }
                continue;
            }
            var (table, warnings) = entry;
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
        foreach (var id in order)
        {
            if (produced.TryGetValue(id, out var entry))
            {
                foreach (var record in entry.Table.Records)
                {
                    WriteRecord(json, record);
                }
            }
            else if (kept is not null && kept.Records.TryGetValue(id, out var keptRecords))
            {
                foreach (var record in keptRecords)
                {
                    record.WriteTo(json);
                }
            }
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    /// <summary>
    /// Column keys are built from arm values (<see cref="ResultKey"/>), so two arms such as "A/B" and "A B" would
    /// share one; a QC file or a comparison of runs could then not tell their numbers apart. Such a results file is
    /// refused rather than written.
    /// </summary>
    private static void RefuseAmbiguousKeys(IReadOnlyList<(LaidOutTable Table, IReadOnlyList<string> Warnings)> tables)
    {
        foreach (var (table, _) in tables)
        {
            var clash = table.Records
                .GroupBy(r => (r.Row, r.Column, r.Statistic))
                .FirstOrDefault(g => g.Count() > 1);
            if (clash is not null)
            {
                var labels = string.Join(" and ", clash.Select(r => $"'{r.RowLabel}' / '{r.ColumnLabel}'").Distinct());
                throw new RunException($"table {table.Document.TableId}: {labels} share the results key {clash.Key.Row} / {clash.Key.Column} / {clash.Key.Statistic}; give the arms values that differ in more than letter case, accents or punctuation");
            }
        }
    }

    private static string SidedName(Sidedness sided) => sided switch
    {
        Sidedness.TwoSided => "two-sided",
        Sidedness.Lower => "lower",
        Sidedness.Upper => "upper",
        _ => throw new ArgumentOutOfRangeException(nameof(sided), sided, "unknown sidedness"),
    };

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
        if (record.Level is { } level)
        {
            json.WriteNumber("level", level);
        }
        if (record.Sided is { } sided)
        {
            json.WriteString("sided", SidedName(sided));
        }
        if (record.Footnotes.Count > 0)
        {
            json.WriteStartArray("footnotes");
            foreach (var letter in record.Footnotes)
            {
                json.WriteStringValue(letter);
            }
            json.WriteEndArray();
        }
        if (record.HeadingFootnotes.Count > 0)
        {
            json.WriteStartArray("headingFootnotes");
            foreach (var letter in record.HeadingFootnotes)
            {
                json.WriteStringValue(letter);
            }
            json.WriteEndArray();
        }
        if (record.Population is { } population)
        {
            json.WriteStartObject("population");
            json.WriteString("name", population.Name);
            json.WriteString("where", population.Where);
            if (population.Subset is not null)
            {
                json.WriteString("subset", population.Subset);
            }
            json.WriteEndObject();
        }
        json.WriteEndObject();
    }
}
