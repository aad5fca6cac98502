using System.Globalization;
using System.Text.Json;
using OutputForge.Analysis;
using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Cli.Calculator;

/// <summary>
/// Writes calculator results as JSON (--json) or readable lines. Numbers are written at full
/// precision; a value that does not exist is null with a "note" saying why. Strata a method left out are named by their
/// number in the input, worded as every table words them (<see cref="NoteWording"/>).
/// </summary>
public sealed class CalcOutput(TextWriter output, bool json)
{
    private readonly List<(string Name, object Value)> _entries = [];

    public void Interval(string name, IntervalResult interval) => _entries.Add((name, interval));

    public void Test(string name, TestResult test) => _entries.Add((name, test));

    public void Number(string name, double value) => _entries.Add((name, value));

    public void Text(string name, string value) => _entries.Add((name, value));

    /// <summary>A group of results under one name (a JSON object; "name.entry" lines in text).</summary>
    public void Group(string name, CalcOutput group) => _entries.Add((name, group));

    /// <summary>Groups in order (a JSON array; "name[1].entry" lines in text).</summary>
    public void Groups(string name, IReadOnlyList<CalcOutput> groups) => _entries.Add((name, groups));

    /// <summary>An empty group to fill and pass to <see cref="Group"/> or <see cref="Groups"/>.</summary>
    public static CalcOutput Nested() => new(TextWriter.Null, true);
    /// <summary>A multiplicity adjustment: one line (or JSON entry) per hypothesis, by the names given.</summary>
    public void Multiplicity(string name, string method, MultiplicityResult result, IReadOnlyList<string> hypotheses) =>
        _entries.Add((name, new MultiplicityEntry(method, result, hypotheses)));

    private sealed record MultiplicityEntry(string Method, MultiplicityResult Result, IReadOnlyList<string> Hypotheses);

    /// <summary>Writes one result as the top-level object (the single-result commands).</summary>
    public void Flush(bool single)
    {
        if (json)
        {
            using var stream = new MemoryStream();
            using (var writer = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
            {
                if (single)
                {
                    WriteValue(writer, _entries[0].Value);
                }
                else
                {
                    WriteObject(writer);
                }
            }
            output.WriteLine(System.Text.Encoding.UTF8.GetString(stream.ToArray()));
            return;
        }
        foreach (var line in Lines(""))
        {
            output.WriteLine(line);
        }
    }

    private IEnumerable<string> Lines(string prefix)
    {
        foreach (var (name, value) in _entries)
        {
            switch (value)
            {
                case CalcOutput group:
                    foreach (var line in group.Lines($"{prefix}{name}."))
                    {
                        yield return line;
                    }
                    break;
                case IReadOnlyList<CalcOutput> groups:
                    for (var i = 0; i < groups.Count; i++)
                    {
                        foreach (var line in groups[i].Lines($"{prefix}{name}[{i + 1}]."))
                        {
                            yield return line;
                        }
                    }
                    break;
                default:
                    yield return Text(prefix + name, value);
                    break;
            }
        }
    }

    private void WriteObject(Utf8JsonWriter writer)
    {
        writer.WriteStartObject();
        foreach (var (name, value) in _entries)
        {
            writer.WritePropertyName(name);
            WriteValue(writer, value);
        }
        writer.WriteEndObject();
    }

    private static void WriteValue(Utf8JsonWriter writer, object value)
    {
        switch (value)
        {
            case double number when double.IsFinite(number):
                writer.WriteNumberValue(number);
                return;
            case double:
                writer.WriteNullValue();
                return;
            case string text:
                writer.WriteStringValue(text);
                return;
            case CalcOutput group:
                group.WriteObject(writer);
                return;
            case IReadOnlyList<CalcOutput> groups:
                writer.WriteStartArray();
                foreach (var group in groups)
                {
                    group.WriteObject(writer);
                }
                writer.WriteEndArray();
                return;
        }
        writer.WriteStartObject();
        switch (value)
        {
            case IntervalResult interval:
                Number(writer, "estimate", interval.IsEstimable ? interval.Estimate : null);
                Number(writer, "lower", interval.IsEstimable ? interval.Lower : null);
                Number(writer, "upper", interval.IsEstimable ? interval.Upper : null);
                Notes(writer, interval.NotEstimableReason, [.. Remarks(interval.StratumRemarks), .. interval.Notes]);
                break;
            case MultiplicityEntry entry:
                writer.WriteString("method", entry.Method);
                writer.WriteNumber("alpha", entry.Result.Alpha);
                writer.WriteStartArray("hypotheses");
                foreach (var h in entry.Result.Hypotheses)
                {
                    writer.WriteStartObject();
                    writer.WriteString("hypothesis", entry.Hypotheses[h.Index]);
                    writer.WriteNumber("rawP", h.RawP);
                    writer.WriteNumber("adjustedP", h.AdjustedP);
                    writer.WriteBoolean("rejected", h.Rejected);
                    Number(writer, "rejectionOrder", h.RejectionOrder);
                    writer.WriteEndObject();
                }
                writer.WriteEndArray();
                break;
            case TestResult test:
                if (test.Statistic is not null || !test.IsEstimable)
                {
                    Number(writer, "statistic", test.IsEstimable ? test.Statistic : null);
                }
                if (test.DegreesOfFreedom is not null)
                {
                    Number(writer, "df", test.DegreesOfFreedom);
                }
                Number(writer, "pValue", test.IsEstimable ? test.PValue : null);
                writer.WriteString("method", test.Method);
                Notes(writer, test.NotEstimableReason, [.. Remarks(test.StratumRemarks), .. test.Notes]);
                break;
        }
        writer.WriteEndObject();
    }

    private static void Number(Utf8JsonWriter writer, string name, double? value)
    {
        if (value is { } number)
        {
            writer.WriteNumber(name, number);
        }
        else
        {
            writer.WriteNull(name);
        }
    }

    private static void Notes(Utf8JsonWriter writer, string? reason, IReadOnlyList<string> notes)
    {
        var all = (reason is null ? notes : [reason, .. notes]).ToList();
        if (all.Count > 0)
        {
            writer.WriteString("note", string.Join("; ", all));
        }
    }

    private static string Text(string name, object value)
    {
        static string F(double? v) => v is { } x ? x.ToString("R", CultureInfo.InvariantCulture) : "not estimable";
        return value switch
        {
            IntervalResult i when i.IsEstimable => $"{name}: estimate {F(i.Estimate)}, CI ({F(i.Lower)}, {F(i.Upper)})" + NoteText(null, [.. Remarks(i.StratumRemarks), .. i.Notes]),
            IntervalResult i => $"{name}: not estimable ({i.NotEstimableReason})",
            TestResult t when t.IsEstimable => $"{name}: {t.Method}" + (t.Statistic is { } s ? $", statistic {F(s)}" : "") +
                (t.DegreesOfFreedom is { } df ? $", df {F(df)}" : "") + $", p-value {F(t.PValue)}" + NoteText(null, [.. Remarks(t.StratumRemarks), .. t.Notes]),
            TestResult t => $"{name}: {t.Method} not estimable ({t.NotEstimableReason})",
            double number => $"{name}: {F(number)}",
            string text => $"{name}: {text}",
            MultiplicityEntry m => string.Join(Environment.NewLine, m.Result.Hypotheses.Select(h =>
                $"{m.Hypotheses[h.Index]}: raw p {F(h.RawP)}, adjusted p {F(h.AdjustedP)}, " +
                (h.Rejected ? $"rejected, order {h.RejectionOrder}" : "not rejected"))
                .Prepend(string.Create(CultureInfo.InvariantCulture, $"{name}: {m.Method}, familywise alpha {F(m.Result.Alpha)}"))),
            _ => name,
        };
    }

    /// <summary>"Stratum 2 has no subjects in group 1 and was skipped.": the strata by their number in the input, from 1.</summary>
    private static IEnumerable<string> Remarks(IReadOnlyList<StratumRemark> remarks) =>
        remarks.Select(r => NoteWording.Word(
            StratumNotes.LeftOut(r, NoteSubject.None, [(r.Stratum + 1).ToString(CultureInfo.InvariantCulture)], g => $"group {g}"), key => key));

    private static string NoteText(string? reason, IReadOnlyList<string> notes) =>
        notes.Count == 0 ? string.Empty : $" [{string.Join("; ", notes)}]";
}
