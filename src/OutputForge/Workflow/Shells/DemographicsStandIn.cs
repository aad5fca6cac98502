using OutputForge.Expressions;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// Demographics: categorical variables by level (see <see cref="CategoricalStandIn"/>), continuous
/// ones as varied numbers written with the spec's "dataDecimals", or whole numbers
/// (<see cref="DefaultDataDecimals"/>) when the spec does not say, which the run log states, since
/// the decimals of mean, SD, median and quartiles follow from those of the data.
/// </summary>
public sealed class DemographicsStandIn : IShellStandIn
{
    public const int DefaultDataDecimals = 0;

    public string Kind => "demographics";

    public void Add(ShellRecords records)
    {
        var assumed = new List<string>();
        foreach (var variable in records.Table.Demographics!.Variables)
        {
            if (variable.Type == "continuous")
            {
                var decimals = variable.DataDecimals ?? DefaultDataDecimals;
                if (variable.DataDecimals is null)
                {
                    assumed.Add(variable.Variable);
                }
                foreach (var subject in records.Subjects)
                {
                    records.SetIfAbsent(subject, variable.Variable,
                        ShellRecords.Number(StandInNumbers.Between(subject.Number, variable.Variable, 10, 90), decimals), VariableKind.Number);
                }
            }
            else
            {
                CategoricalStandIn.Add(records, variable.Variable, variable.Levels, variable.OrderBy, null);
            }
        }
        if (assumed.Count > 0)
        {
            records.Assumptions.Add($"{string.Join(", ", assumed)} {(assumed.Count == 1 ? "has" : "have")} no \"dataDecimals\"; the shell shows {(assumed.Count == 1 ? "it" : "them")} as collected in whole numbers (mean and median with 1 decimal, SD with 2); set \"dataDecimals\" for the precision the data will have");
        }
    }
}
