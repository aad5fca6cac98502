using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Kinds.Continuous;

/// <summary>
/// The endpoint records of each visit of a continuous table (PARAMCD, the endpoint's further
/// condition, and AVISIT = the visit), at most one per subject and visit, in row order with their USUBJID.
/// </summary>
internal sealed class VisitRecords
{
    private VisitRecords(Dataset dataset, IReadOnlyDictionary<string, List<(string Subject, int Row)>> inRowOrder)
    {
        Dataset = dataset;
        _inRowOrder = inRowOrder;
    }

    private readonly IReadOnlyDictionary<string, List<(string Subject, int Row)>> _inRowOrder;

    public Dataset Dataset { get; }

    /// <summary>The visit's records with their subjects, in row order.</summary>
    public IReadOnlyList<(string Subject, int Row)> InRowOrder(string visit) => _inRowOrder[visit];

    public static VisitRecords Select(TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<ContinuousSettings>();
        var dataset = data[endpoint.Dataset];
        var file = Path.GetFileName(dataset.File);
        var visitVariable = dataset.Find("AVISIT") ?? throw new SpecException(table.Source.Problem("/continuous/visits",
            $"{file} has no AVISIT variable, which the visits select on"));
        var known = visitVariable.DistinctValues();
        for (var i = 0; i < settings.Visits.Count; i++)
        {
            if (!known.Contains(settings.Visits[i], StringComparer.Ordinal))
            {
                throw new SpecException(table.Source.Problem(SpecProblemCode.UnknownDataValue, $"/continuous/visits/{i}",
                    $"no record of {file} has AVISIT '{settings.Visits[i]}'{NearestName.Hint(settings.Visits[i], known.ToList())}"));
            }
        }
        IReadOnlyList<int>? candidates = null;
        if (endpoint.Parameter is not null)
        {
            var paramcd = dataset.Find("PARAMCD") ?? throw new SpecException(table.Source.Problem("/endpoint/parameter",
                $"{file} has no PARAMCD variable, which this key selects on"));
            var codes = paramcd.DistinctValues();
            if (!codes.Contains(endpoint.Parameter, StringComparer.Ordinal))
            {
                throw new SpecException(table.Source.Problem(SpecProblemCode.UnknownDataValue, "/endpoint/parameter",
                    $"no record of {file} has PARAMCD '{endpoint.Parameter}'{NearestName.Hint(endpoint.Parameter, codes.ToList())}"));
            }
            // The records of the parameter come from the column's shared index rather than a scan of the dataset.
            candidates = paramcd.RowsWith(endpoint.Parameter);
        }
        var where = endpoint.Where is null ? null : new SpecConditionText(endpoint.Where, table.Source, "/endpoint/where").Compile(dataset);
        var subjects = dataset.Get(AdamConformance.SubjectVariable);
        var inRowOrder = new Dictionary<string, List<(string Subject, int Row)>>(StringComparer.Ordinal);
        // Each visit's records are the rows both of the parameter and of AVISIT = visit, taken from the columns' shared
        // indexes (ascending rows) instead of reading the visit of every record of the parameter.
        (string Visit, int First, int Second)? duplicate = null;
        foreach (var visit in settings.Visits.Distinct())
        {
            var rows = new Dictionary<string, int>(StringComparer.Ordinal);
            var ordered = new List<(string Subject, int Row)>();
            inRowOrder[visit] = ordered;
            var visitRows = visitVariable.RowsWith(visit);
            foreach (var row in candidates is null ? visitRows : SortedRows.Intersection(visitRows, candidates))
            {
                if (where is not null && !where.Matches(row))
                {
                    continue;
                }
                var subject = subjects.GetText(row)!;
                if (!rows.TryAdd(subject, row))
                {
                    // Reading all records in row order would stop at the lowest repeated row of any visit.
                    if (duplicate is null || row < duplicate.Value.Second)
                    {
                        duplicate = (visit, rows[subject], row);
                    }
                    break;
                }
                ordered.Add((subject, row));
            }
        }
        if (duplicate is (var repeated, var first, var second))
        {
            throw new SpecException(table.Source.Problem(endpoint.Where is null ? "/endpoint" : "/endpoint/where",
                $"the endpoint selects more than one {repeated} record of subject {subjects.GetText(second)} ({file} lines {dataset.LineOfRow[first]} and {dataset.LineOfRow[second]}); narrow the selection so that each subject has at most one record per visit (e.g. ANL01FL = 'Y')"));
        }
        return new VisitRecords(dataset, inRowOrder);
    }
}
