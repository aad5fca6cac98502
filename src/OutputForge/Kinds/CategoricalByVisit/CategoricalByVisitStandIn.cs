using System.Globalization;
using System.Text.Json;
using OutputForge.Expressions;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// Categorical responses by visit: per visit of the spec (or one placeholder visit) one observed record
/// per subject, the spec's categories taken in turn so that every category row has subjects, and the
/// strata (if any) split in two so that every stratum holds several subjects of each arm.
/// </summary>
public sealed class CategoricalByVisitStandIn : IShellStandIn
{
    /// <summary>The visit a shell shows when the spec lists none.</summary>
    public const string PlaceholderVisit = "Visit x";

    public void Add(ShellRecords records)
    {
        var endpoint = records.Table.Endpoint!;
        var settings = records.Table.Settings<CategoricalByVisitSettings>();
        var dataset = endpoint.Dataset;
        var visits = settings.Visits is { Count: > 0 } listed ? listed : [endpoint.Visit ?? PlaceholderVisit];
        var numeric = !settings.Variable.Equals("AVALC", StringComparison.OrdinalIgnoreCase);
        records.Declare(dataset, settings.Variable, numeric ? VariableKind.Number : VariableKind.Text);
        records.Declare(dataset, "AVISITN", VariableKind.Number);
        records.Declare(dataset, "DTYPE", VariableKind.Text);
        foreach (var subject in records.Subjects)
        {
            foreach (var stratum in settings.Strata)
            {
                records.SetIfAbsent(subject, stratum, subject.IndexInArm % 2 == 0 ? "Stratum 1" : "Stratum 2", VariableKind.Text);
            }
        }
        foreach (var (visit, v) in visits.Distinct().Select((visit, v) => (visit, v)))
        {
            var selected = EndpointStandIn.Selected(records, endpoint, visit);
            foreach (var subject in records.Subjects)
            {
                var record = EndpointStandIn.For(subject, selected);
                var category = settings.Categories[(subject.IndexInArm + v) % settings.Categories.Count].Value;
                record[settings.Variable] = category.ValueKind == JsonValueKind.Number
                    ? category.GetDouble().ToString("R", CultureInfo.InvariantCulture)
                    : category.GetString();
                record.TryAdd("AVISITN", (v + 1).ToString(CultureInfo.InvariantCulture));
                record.TryAdd("DTYPE", null);
                records.AddRecord(dataset, record);
            }
        }
    }
}
