using OutputForge.Expressions;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.TimeToEvent;

/// <summary>
/// Time to event: one record per subject, times spread beyond the last estimate time of the spec
/// (so that every Kaplan-Meier estimate, the median and its interval are reached), the last
/// subject of each arm censored, and strata of two levels.
/// </summary>
public sealed class TimeToEventStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        var endpoint = records.Table.Endpoint!;
        var settings = records.Table.Settings<TimeToEventSettings>();
        var dataset = endpoint.Dataset;
        var selected = EndpointStandIn.Selected(records, endpoint);
        var horizon = 2 * (settings.Times.Count > 0 ? settings.Times.Max() : 100);
        var n = ShellRecords.SubjectsPerArm;
        foreach (var subject in records.Subjects)
        {
            var record = EndpointStandIn.For(subject, selected);
            // Distinct times in every arm, interleaved between arms.
            var time = Math.Round(horizon * (subject.IndexInArm + 1 + 0.25 * subject.Arm) / (n + 1));
            EndpointStandIn.SetNumber(records, dataset, record, settings.Time, time, 0);
            EndpointStandIn.SetNumber(records, dataset, record, settings.Censor, subject.IndexInArm == n - 1 ? 1 : 0, 0);
            foreach (var (stratum, s) in settings.Strata.Select((stratum, s) => (stratum, s)))
            {
                records.Declare(dataset, stratum, VariableKind.Text);
                record.TryAdd(stratum, ((subject.IndexInArm >> s) & 1) == 0 ? "A" : "B");
            }
            records.AddRecord(dataset, record);
        }
    }
}
