using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>
/// The records an endpoint selects (PARAMCD, AVISIT and a further condition), at most one per
/// subject, keyed by USUBJID.
/// </summary>
public sealed class EndpointRecords
{
    private EndpointRecords(Dataset dataset, IReadOnlyDictionary<string, int> rowOfSubject)
    {
        Dataset = dataset;
        RowOfSubject = rowOfSubject;
    }

    public Dataset Dataset { get; }

    /// <summary>The selected record (row index) of each subject that has one.</summary>
    public IReadOnlyDictionary<string, int> RowOfSubject { get; }

    public static EndpointRecords Select(TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var dataset = data[endpoint.Dataset];
        // The parameter's records come from the PARAMCD column's shared index rather than a scan of the dataset.
        var candidates = endpoint.Parameter is null ? null
            : Variable(dataset, "PARAMCD", endpoint.Parameter, table.Source, "/endpoint/parameter").RowsWith(endpoint.Parameter);
        if (endpoint.Visit is not null)
        {
            // So are the visit's records: the rows of both, in row order.
            var visitRows = Variable(dataset, "AVISIT", endpoint.Visit, table.Source, "/endpoint/visit").RowsWith(endpoint.Visit);
            candidates = candidates is null ? visitRows : SortedRows.Intersection(candidates, visitRows);
        }
        var where = endpoint.Where is null ? null : new SpecConditionText(endpoint.Where, table.Source, "/endpoint/where").Compile(dataset);
        var subjects = dataset.Get(AdamConformance.SubjectVariable);
        var rowOfSubject = new Dictionary<string, int>(StringComparer.Ordinal);
        var count = candidates?.Count ?? dataset.RowCount;
        for (var i = 0; i < count; i++)
        {
            var row = candidates?[i] ?? i;
            if (where is not null && !where.Matches(row))
            {
                continue;
            }
            var subject = subjects.GetText(row)!;
            if (!rowOfSubject.TryAdd(subject, row))
            {
                var first = dataset.LineOfRow[rowOfSubject[subject]];
                throw new SpecException(table.Source.Problem(SpecProblemCode.DuplicateRecords, endpoint.Where is null ? "/endpoint" : "/endpoint/where",
                    $"the endpoint selects more than one record of subject {subject} ({Path.GetFileName(dataset.File)} lines {first} and {dataset.LineOfRow[row]}); narrow the selection so that each subject has at most one record (e.g. ANL01FL = 'Y')"));
            }
        }
        return new EndpointRecords(dataset, rowOfSubject);
    }

    /// <summary>What <see cref="Select"/> reads of the endpoint's dataset: the subject, PARAMCD, AVISIT and the record selection.</summary>
    public static VariableReads Reads(TableSpec table, VariableReads reads)
    {
        var endpoint = table.Endpoint!;
        return reads.Add(endpoint.Dataset, AdamConformance.SubjectVariable)
            .Add(endpoint.Dataset, endpoint.Parameter is null ? null : "PARAMCD")
            .Add(endpoint.Dataset, endpoint.Visit is null ? null : "AVISIT")
            .AddCondition(endpoint.Dataset, endpoint.Where);
    }

    /// <summary>The selecting variable, checked to hold <paramref name="value"/> somewhere.</summary>
    private static DataColumn Variable(Dataset dataset, string variableName, string value, SpecSource source, string pointer)
    {
        var variable = dataset.Find(variableName) ?? throw new SpecException(source.Problem(pointer,
            $"{Path.GetFileName(dataset.File)} has no {variableName} variable, which this key selects on"));
        var values = variable.DistinctValues();
        if (!values.Contains(value, StringComparer.Ordinal))
        {
            throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, pointer,
                $"no record of {Path.GetFileName(dataset.File)} has {variableName} '{value}'{NearestName.Hint(value, values.ToList())}"));
        }
        return variable;
    }

    /// <summary>Compiles the endpoint's response condition against the endpoint's dataset.</summary>
    public Condition CompileResponse(TableSpec table) =>
        new SpecConditionText(table.Endpoint!.Response!, table.Source, "/endpoint/response").Compile(Dataset);
}
