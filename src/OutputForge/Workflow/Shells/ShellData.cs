using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Spec;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// Stand-in study data from which a table kind's own analysis lays out a mock shell before real
/// data exist: per arm of the study spec's treatment.arms, <see cref="SubjectsPerArm"/> invented
/// subjects whom the table's population and subset select, and for the endpoint one record per
/// subject that the record selection picks, half of them meeting the response definition. Every
/// value comes from the conditions of the specs (see <see cref="ConditionWitness"/>); none is shown,
/// because the shell replaces every number with a placeholder.
/// </summary>
public static class ShellData
{
    /// <summary>Ten per arm, split five and five: no expected count is below 5 and no number is inestimable.</summary>
    public const int SubjectsPerArm = 10;

    private const string Subject = AdamConformance.SubjectVariable;

    /// <summary>
    /// The kinds whose stand-in records this class can make: those defined by a population and one
    /// endpoint record per subject. Kinds whose rows depend on data values (levels, terms, visits)
    /// need stand-ins of their own and are skipped with a warning until they have them.
    /// </summary>
    public static readonly IReadOnlyList<string> SupportedKinds = ["responders"];

    public static bool Supports(string kind) => SupportedKinds.Contains(kind, StringComparer.Ordinal);

    public static StudyData For(StudySpec study, TableSpec table)
    {
        var arms = study.Treatment.Arms ?? throw new SpecException(study.Source.Problem("/treatment",
            "shells need the arms before there are data: add \"arms\": [{\"value\": \"Placebo\", \"order\": 0}, ...] to the treatment"));
        var population = study.Populations[table.Population];
        var treatment = population.Treatment ?? study.Treatment.Variable;
        var order = population.Treatment is null ? study.Treatment.Order : population.Order;
        var selects = table.Subset is null ? population.Where : $"({population.Where}) and ({table.Subset})";
        var wherePointer = table.Subset is null ? $"/populations/{table.Population}/where" : "/subset";
        var whereSource = table.Subset is null ? study.Source : table.Source;

        var subjects = new List<Dictionary<string, string?>>();
        foreach (var (arm, index) in arms.Select((a, i) => (a, i)))
        {
            var fixedValues = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase) { [treatment] = arm.Value };
            if (order is not null)
            {
                fixedValues[order] = arm.Order.ToString("R", CultureInfo.InvariantCulture);
            }
            var values = Witness(selects, true, fixedValues, whereSource, wherePointer);
            // A responder table stratified by ADSL variables needs them; one stand-in stratum is enough for a shell.
            foreach (var stratum in table.Responders?.Stratified?.Strata ?? [])
            {
                values = new Dictionary<string, string?>(values, StringComparer.OrdinalIgnoreCase) { [stratum] = values.GetValueOrDefault(stratum) ?? "Stratum" };
            }
            for (var k = 1; k <= SubjectsPerArm; k++)
            {
                subjects.Add(new Dictionary<string, string?>(values, StringComparer.OrdinalIgnoreCase)
                {
                    [Subject] = string.Create(CultureInfo.InvariantCulture, $"SHELL-{index + 1}-{k:00}"),
                });
            }
        }
        var adslKinds = ConditionWitness.Literals(selects);
        if (order is not null)
        {
            adslKinds[order] = [new Literal(null, 0, 0)];
        }
        var datasets = new List<Dataset> { Build("adsl", subjects, adslKinds) };
        if (table.Endpoint is { } endpoint)
        {
            datasets.Add(Endpoint(table, endpoint, subjects));
        }
        foreach (var name in study.Data.Datasets.Keys.Where(n => datasets.All(d => d.Name != n)))
        {
            datasets.Add(Build(name, [], []));
        }
        return StudyData.FromDatasets("(mock shell: no data)", datasets);
    }

    private static Dataset Endpoint(TableSpec table, EndpointSpec endpoint, List<Dictionary<string, string?>> subjects)
    {
        var fixedValues = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase);
        if (endpoint.Parameter is not null)
        {
            fixedValues["PARAMCD"] = endpoint.Parameter;
        }
        if (endpoint.Visit is not null)
        {
            fixedValues["AVISIT"] = endpoint.Visit;
        }
        var response = endpoint.Response ?? "AVALC = 'Y'";
        var respond = endpoint.Where is null ? response : $"({endpoint.Where}) and ({response})";
        var notRespond = endpoint.Where is null ? $"not ({response})" : $"({endpoint.Where}) and not ({response})";
        var responder = Witness(respond, true, fixedValues, table.Source, "/endpoint/response");
        var nonResponder = Witness(notRespond, true, fixedValues, table.Source, "/endpoint/response");
        var records = subjects.Select((s, i) => new Dictionary<string, string?>(i % SubjectsPerArm < SubjectsPerArm / 2 ? responder : nonResponder,
            StringComparer.OrdinalIgnoreCase) { [Subject] = s[Subject] }).ToList();
        var kinds = ConditionWitness.Literals(respond);
        return Build(endpoint.Dataset, records, kinds);
    }

    private static IReadOnlyDictionary<string, string?> Witness(string condition, bool wanted, IReadOnlyDictionary<string, string?> fixedValues,
        SpecSource source, string pointer) =>
        ConditionWitness.Find(condition, wanted, fixedValues) ?? throw new SpecException(source.Problem(pointer,
            $"no stand-in record meets \"{condition}\" with the literals it names, so the shell cannot be laid out; simplify the condition"));

    private static Dataset Build(string name, List<Dictionary<string, string?>> rows, Dictionary<string, List<Literal>> literals)
    {
        var names = new List<string> { Subject };
        names.AddRange(rows.SelectMany(r => r.Keys).Where(k => !k.Equals(Subject, StringComparison.OrdinalIgnoreCase))
            .Distinct(StringComparer.OrdinalIgnoreCase));
        var columns = names.Select(n => StandInColumn.Create(n,
            literals.TryGetValue(n, out var l) ? ConditionWitness.KindOf(l) : VariableKind.Text,
            rows.Select(r => r.GetValueOrDefault(n)).ToList())).ToList();
        return new Dataset(name, $"{name} (mock shell)", rows.Count, columns, rows.Select((_, i) => i + 2).ToList());
    }
}
