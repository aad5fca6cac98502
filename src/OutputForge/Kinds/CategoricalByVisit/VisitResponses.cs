using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// The response records of a categorical-by-visit table: PARAMCD, the endpoint's condition, the DTYPE
/// choice (observed records, i.e. DTYPE empty, plus the named imputation type if any) and the visits,
/// at most one record per subject and visit. Visits are the spec's, or every visit of the selected
/// records ordered by AVISITN.
/// </summary>
internal sealed class VisitResponses
{
    public sealed record Response(int Row, int Category, bool Imputed);

    private VisitResponses(Dataset dataset, IReadOnlyList<string> visits, IReadOnlyDictionary<string, Dictionary<string, Response>> byVisit)
    {
        Dataset = dataset;
        Visits = visits;
        _byVisit = byVisit;
    }

    private readonly IReadOnlyDictionary<string, Dictionary<string, Response>> _byVisit;

    public Dataset Dataset { get; }

    public IReadOnlyList<string> Visits { get; }

    /// <summary>The response of each subject with a record at the visit; Category is -1 for a missing value.</summary>
    public IReadOnlyDictionary<string, Response> OfVisit(string visit) => _byVisit[visit];

    public static VisitResponses Select(TableSpec table, StudyData data, ResponseCategories categories, List<string> warnings)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<CategoricalByVisitSettings>();
        var source = table.Source;
        var dataset = data[endpoint.Dataset];
        var file = Path.GetFileName(dataset.File);
        if (endpoint.Visit is not null)
        {
            throw new SpecException(source.Problem("/endpoint/visit", "this kind shows several visits; list them under \"categoricalByVisit\": { \"visits\": [...] }"));
        }
        var visitVariable = dataset.Find("AVISIT") ?? throw new SpecException(source.Problem("/endpoint/dataset",
            $"{file} has no AVISIT variable, which this kind groups the responses by"));
        var value = dataset.Find(settings.Variable) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, "/categoricalByVisit/variable",
            $"{file} has no variable {settings.Variable}{NearestName.Hint(settings.Variable, dataset.VariableNames)}"));
        var tests = new List<Func<int, bool>>();
        if (endpoint.Parameter is not null)
        {
            var paramcd = dataset.Find("PARAMCD") ?? throw new SpecException(source.Problem("/endpoint/parameter",
                $"{file} has no PARAMCD variable, which this key selects on"));
            var codes = paramcd.DistinctValues();
            if (!codes.Contains(endpoint.Parameter, StringComparer.Ordinal))
            {
                throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, "/endpoint/parameter",
                    $"no record of {file} has PARAMCD '{endpoint.Parameter}'{NearestName.Hint(endpoint.Parameter, codes.ToList())}"));
            }
            tests.Add(row => string.Equals(paramcd.GetText(row), endpoint.Parameter, StringComparison.Ordinal));
        }
        if (endpoint.Where is not null)
        {
            tests.Add(new SpecConditionText(endpoint.Where, source, "/endpoint/where").Compile(dataset).Matches);
        }
        tests.Add(DerivationTest(dataset, settings.Imputation, source, file, warnings));
        var dtype = dataset.Find("DTYPE");

        var selected = Enumerable.Range(0, dataset.RowCount).Where(row => tests.TrueForAll(t => t(row))).ToList();
        var visits = ChooseVisits(settings, dataset, visitVariable, selected, source, file);
        var subjects = dataset.Get(AdamConformance.SubjectVariable);
        var byVisit = visits.ToDictionary(v => v, _ => new Dictionary<string, Response>(StringComparer.Ordinal), StringComparer.Ordinal);
        foreach (var row in selected)
        {
            if (visitVariable.GetText(row) is not { } visit || !byVisit.TryGetValue(visit, out var responses))
            {
                continue;
            }
            var subject = subjects.GetText(row)!;
            var category = -1;
            if (!value.IsMissing(row))
            {
                category = categories.IndexOf(value, row);
                if (category < 0)
                {
                    throw new SpecException(source.Problem("/categoricalByVisit/categories",
                        $"{settings.Variable} '{value.GetText(row)}' ({file} line {dataset.LineOfRow[row]}) is not one of the categories ({string.Join(", ", categories.Items.Select(c => c.ValueText))}); add it to the list or narrow the record selection"));
                }
            }
            if (!responses.TryAdd(subject, new Response(row, category, dtype is not null && !dtype.IsMissing(row))))
            {
                throw new SpecException(source.Problem(endpoint.Where is null ? "/endpoint" : "/endpoint/where",
                    $"the endpoint selects more than one {visit} record of subject {subject} ({file} lines {dataset.LineOfRow[responses[subject].Row]} and {dataset.LineOfRow[row]}); narrow the selection so that each subject has at most one record per visit (e.g. ANL01FL = 'Y')"));
            }
        }
        return new VisitResponses(dataset, visits, byVisit);
    }

    /// <summary>Observed records have DTYPE empty (ADaM); with an imputation type its derived records are kept too.</summary>
    private static Func<int, bool> DerivationTest(Dataset dataset, string? imputation, SpecSource source, string file, List<string> warnings)
    {
        var dtype = dataset.Find("DTYPE");
        if (dtype is null)
        {
            if (imputation is not null)
            {
                throw new SpecException(source.Problem("/categoricalByVisit/imputation",
                    $"{file} has no DTYPE variable, so it holds no '{imputation}' records; leave out \"imputation\" to use the observed records"));
            }
            return _ => true;
        }
        if (imputation is not null)
        {
            var types = dtype.DistinctValues();
            if (!types.Contains(imputation, StringComparer.Ordinal))
            {
                warnings.Add($"No record of {file} has DTYPE '{imputation}' ({(types.Count == 0 ? "no record has a DTYPE" : "DTYPE values: " + string.Join(", ", types))}); the table shows observed responses only.");
            }
        }
        return row => dtype.IsMissing(row) || (imputation is not null && string.Equals(dtype.GetText(row), imputation, StringComparison.Ordinal));
    }

    private static List<string> ChooseVisits(CategoricalByVisitSettings settings, Dataset dataset, DataColumn visitVariable, List<int> selected,
        SpecSource source, string file)
    {
        var present = selected.Select(visitVariable.GetText).OfType<string>().Distinct(StringComparer.Ordinal).ToList();
        if (settings.Visits is { } listed)
        {
            for (var i = 0; i < listed.Count; i++)
            {
                if (!present.Contains(listed[i], StringComparer.Ordinal))
                {
                    throw new SpecException(source.Problem($"/categoricalByVisit/visits/{i}",
                        $"no selected record of {file} has AVISIT '{listed[i]}'{NearestName.Hint(listed[i], present)}"));
                }
            }
            return listed.Distinct(StringComparer.Ordinal).ToList();
        }
        if (present.Count == 0)
        {
            throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, "/endpoint", $"the endpoint selects no record of {file} with an AVISIT value"));
        }
        var order = dataset.Find("AVISITN") ?? throw new SpecException(source.Problem("/categoricalByVisit",
            $"{file} has no AVISITN to order the visits by; list them under \"visits\""));
        var rank = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var row in selected)
        {
            if (visitVariable.GetText(row) is { } visit && order.GetNumber(row) is var n && !double.IsNaN(n))
            {
                rank[visit] = Math.Min(rank.GetValueOrDefault(visit, double.MaxValue), n);
            }
        }
        return present.OrderBy(v => rank.GetValueOrDefault(v, double.MaxValue)).ThenBy(v => v, StringComparer.Ordinal).ToList();
    }
}
