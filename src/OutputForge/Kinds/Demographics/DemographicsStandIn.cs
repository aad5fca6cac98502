using OutputForge.Expressions;
using OutputForge.Spec;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// Demographics: categorical variables by level (see <see cref="CategoricalStandIn"/>), continuous
/// ones as varied numbers written with the spec's "dataDecimals", or whole numbers
/// (<see cref="DefaultDataDecimals"/>) when the spec does not say, which the run log states, since
/// the decimals of mean, SD, median and quartiles follow from those of the data.
/// </summary>
public sealed class DemographicsStandIn : IShellStandIn
{
    public const int DefaultDataDecimals = 0;

    public void Add(ShellRecords records)
    {
        var settings = records.Table.Settings<DemographicsSettings>();
        var assumed = new List<string>();
        foreach (var (variable, i) in settings.Variables.Select((v, i) => (v, i)))
        {
            if (variable.Type == DemographicVariableType.Continuous)
            {
                var decimals = variable.DataDecimals ?? DefaultDataDecimals;
                if (variable.DataDecimals is null && ShownAtDataPrecision(variable, settings, records.Table.Source, $"/demographics/variables/{i}"))
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
            records.Assumptions.Add($"{string.Join(", ", assumed)} {(assumed.Count == 1 ? "has" : "have")} no \"dataDecimals\"; the shell takes {(assumed.Count == 1 ? "it" : "them")} as collected in whole numbers (so mean and median with 1 decimal, SD with 2, unless the spec sets their decimals); set \"dataDecimals\" for the precision the data will have");
        }
    }

    /// <summary>Whether a statistic the variable's rows show takes its decimals from the data's (no decimals of its own in the spec).</summary>
    private static bool ShownAtDataPrecision(DemographicVariableSpec variable, DemographicsSettings settings, SpecSource source, string pointer) =>
        (variable.Rows ?? StatisticRowLayout.DefaultRows)
            .Select((text, i) => StatisticRowLayout.Parse(text, source, variable.Rows is null ? pointer : $"{pointer}/rows/{i}"))
            .SelectMany(row => row.Statistics)
            .Any(statistic => StatisticDecimals.For(statistic, 0, variable.Decimals, settings.Decimals)
                != StatisticDecimals.For(statistic, 1, variable.Decimals, settings.Decimals));
}
