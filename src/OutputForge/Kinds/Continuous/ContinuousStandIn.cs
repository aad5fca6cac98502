using OutputForge.Expressions;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Continuous;

/// <summary>
/// Continuous endpoints by visit: per visit of the spec one record per subject with a varied value,
/// baseline and change at the spec's decimals, varied model covariates, factors of two levels
/// (split differently per factor, so that none is a function of another or of the arm) and the
/// dose variable as the arm's order.
/// </summary>
public sealed class ContinuousStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        var endpoint = records.Table.Endpoint!;
        var settings = records.Table.Settings<ContinuousSettings>();
        var dataset = endpoint.Dataset;
        var arms = records.Study.Treatment.Arms!;
        var d = settings.Decimals;
        foreach (var (visit, v) in settings.Visits.Distinct().Select((visit, v) => (visit, v)))
        {
            var selected = EndpointStandIn.Selected(records, endpoint, visit);
            foreach (var subject in records.Subjects)
            {
                var record = EndpointStandIn.For(subject, selected);
                var seed = subject.Number * 100 + v;
                var value = Math.Round(StandInNumbers.Between(seed, settings.Value, 2, 8), d, MidpointRounding.AwayFromZero);
                var baseline = Math.Round(StandInNumbers.Between(subject.Number, "baseline", 2, 8), d, MidpointRounding.AwayFromZero);
                EndpointStandIn.SetNumber(records, dataset, record, settings.Value, value, d);
                if (settings.Baseline is { } baselineName)
                {
                    EndpointStandIn.SetNumber(records, dataset, record, baselineName, baseline, d);
                }
                if (settings.Change is { } changeName)
                {
                    EndpointStandIn.SetNumber(records, dataset, record, changeName, value - baseline, d);
                }
                if (settings.Model is { } model)
                {
                    foreach (var covariate in model.Covariates)
                    {
                        EndpointStandIn.SetNumber(records, dataset, record, covariate, StandInNumbers.Between(seed, covariate, 0, 10), 2);
                    }
                    foreach (var (factor, f) in model.Factors.Select((factor, f) => (factor, f)))
                    {
                        records.Declare(dataset, factor, VariableKind.Text);
                        record.TryAdd(factor, ((subject.IndexInArm >> f) & 1) == 0 ? "A" : "B");
                    }
                    if (model.DoseVariable is { } dose && !subject.Has(dose))
                    {
                        EndpointStandIn.SetNumber(records, dataset, record, dose, arms[subject.Arm].Order, 3);
                    }
                }
                records.AddRecord(dataset, record);
            }
        }
    }
}
