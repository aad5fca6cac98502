using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Spec;

namespace OutputForge.Analysis.StandIns;

/// <summary>
/// The values an endpoint record needs to be selected: PARAMCD the endpoint's parameter, AVISIT its
/// visit (or the visit given), and values meeting the endpoint's record selection and any further
/// condition (a response definition, or its negation).
/// </summary>
public static class EndpointStandIn
{
    public static Dictionary<string, string?> Selected(ShellRecords records, EndpointSpec endpoint, string? visit = null,
        string? condition = null, string conditionPointer = "/endpoint/where")
    {
        var fixedValues = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase);
        if (endpoint.Parameter is not null)
        {
            fixedValues["PARAMCD"] = endpoint.Parameter;
        }
        if ((visit ?? endpoint.Visit) is { } avisit)
        {
            fixedValues["AVISIT"] = avisit;
        }
        var selects = (endpoint.Where, condition) switch
        {
            (null, null) => null,
            (null, { } c) => c,
            ({ } w, null) => w,
            ({ } w, { } c) => $"({w}) and ({c})",
        };
        if (selects is null)
        {
            return fixedValues;
        }
        return new Dictionary<string, string?>(records.Witness(selects, fixedValues, endpoint.Dataset, records.Table.Source,
            condition is null ? "/endpoint/where" : conditionPointer), StringComparer.OrdinalIgnoreCase);
    }

    /// <summary>One record of <paramref name="subject"/> with <paramref name="values"/>.</summary>
    public static Dictionary<string, string?> For(ShellSubject subject, IReadOnlyDictionary<string, string?> values) =>
        new(values, StringComparer.OrdinalIgnoreCase) { [AdamConformance.SubjectVariable] = subject.Id };

    /// <summary>A numeric variable of the record: declared a number, its value written with <paramref name="decimals"/> decimals.</summary>
    public static void SetNumber(ShellRecords records, string dataset, Dictionary<string, string?> record, string variable, double value, int decimals)
    {
        records.Declare(dataset, variable, VariableKind.Number);
        record.TryAdd(variable, ShellRecords.Number(value, decimals));
    }
}
