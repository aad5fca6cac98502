using OutputForge.Expressions;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.AdverseEvents;

/// <summary>
/// Adverse events: one counted event per subject, in one system organ class and one preferred term
/// both labelled <see cref="ShellRecords.PlaceholderLevel"/> (classes and terms come from the data),
/// the severities of the spec in turn.
/// </summary>
public sealed class AdverseEventStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        var settings = records.Table.Settings<AdverseEventsSettings>();
        var values = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase)
        {
            [settings.SocVariable] = ShellRecords.PlaceholderLevel,
            [settings.TermVariable] = ShellRecords.PlaceholderLevel,
        };
        var counted = settings.Where is null ? values
            : new Dictionary<string, string?>(records.Witness(settings.Where, values, settings.Dataset, records.Table.Source, "/adverseEvents/where"),
                StringComparer.OrdinalIgnoreCase);
        records.Declare(settings.Dataset, settings.SocVariable, VariableKind.Text);
        records.Declare(settings.Dataset, settings.TermVariable, VariableKind.Text);
        foreach (var subject in records.Subjects)
        {
            var record = EndpointStandIn.For(subject, counted);
            if (settings.Severity is { } severity)
            {
                records.Declare(settings.Dataset, severity.Variable, VariableKind.Text);
                record[severity.Variable] = severity.Levels[subject.IndexInArm % severity.Levels.Count].Value;
            }
            records.AddRecord(settings.Dataset, record);
        }
    }
}
