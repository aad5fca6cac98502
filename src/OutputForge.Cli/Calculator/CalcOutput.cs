using System.Globalization;
using System.Text.Json;
using OutputForge.Stats;

namespace OutputForge.Cli.Calculator;

/// <summary>
/// Writes calculator results as JSON (--json) or readable lines. Numbers are written at full
/// precision; a value that does not exist is null with a "note" saying why.
/// </summary>
public sealed class CalcOutput(TextWriter output, bool json)
{
    private readonly List<(string Name, object Value)> _entries = [];

    public void Interval(string name, IntervalResult interval) => _entries.Add((name, interval));

    public void Test(string name, TestResult test) => _entries.Add((name, test));

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
                    writer.WriteStartObject();
                    foreach (var (name, value) in _entries)
                    {
                        writer.WritePropertyName(name);
                        WriteValue(writer, value);
                    }
                    writer.WriteEndObject();
                }
            }
            output.WriteLine(System.Text.Encoding.UTF8.GetString(stream.ToArray()));
            return;
        }
        foreach (var (name, value) in _entries)
        {
            output.WriteLine(Text(name, value));
        }
    }

    private static void WriteValue(Utf8JsonWriter writer, object value)
    {
        writer.WriteStartObject();
        switch (value)
        {
            case IntervalResult interval:
                Number(writer, "estimate", interval.IsEstimable ? interval.Estimate : null);
                Number(writer, "lower", interval.IsEstimable ? interval.Lower : null);
                Number(writer, "upper", interval.IsEstimable ? interval.Upper : null);
                Notes(writer, interval.NotEstimableReason, interval.Notes);
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
                Notes(writer, test.NotEstimableReason, test.Notes);
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
            IntervalResult i when i.IsEstimable => $"{name}: estimate {F(i.Estimate)}, CI ({F(i.Lower)}, {F(i.Upper)})" + NoteText(null, i.Notes),
            IntervalResult i => $"{name}: not estimable ({i.NotEstimableReason})",
            TestResult t when t.IsEstimable => $"{name}: {t.Method}" + (t.Statistic is { } s ? $", statistic {F(s)}" : "") +
                (t.DegreesOfFreedom is { } df ? $", df {F(df)}" : "") + $", p-value {F(t.PValue)}" + NoteText(null, t.Notes),
            TestResult t => $"{name}: {t.Method} not estimable ({t.NotEstimableReason})",
            MultiplicityEntry m => string.Join(Environment.NewLine, m.Result.Hypotheses.Select(h =>
                $"{m.Hypotheses[h.Index]}: raw p {F(h.RawP)}, adjusted p {F(h.AdjustedP)}, " +
                (h.Rejected ? $"rejected, order {h.RejectionOrder}" : "not rejected"))
                .Prepend(string.Create(CultureInfo.InvariantCulture, $"{name}: {m.Method}, familywise alpha {F(m.Result.Alpha)}"))),
            _ => name,
        };
    }

    private static string NoteText(string? reason, IReadOnlyList<string> notes) =>
        notes.Count == 0 ? string.Empty : $" [{string.Join("; ", notes)}]";
}
