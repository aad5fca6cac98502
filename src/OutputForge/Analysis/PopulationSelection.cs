using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;
using OutputForge.Results;

namespace OutputForge.Analysis;

/// <summary>
/// The subjects of one analysis population (optionally narrowed by a table's subset), grouped by
/// treatment arm in display order. Subjects with no arm value are left out, and a warning says how many. An arm the
/// study spec lists, or one of the population that the table's subset empties, keeps its column with N=0 and a warning
/// (which the table prints as a footnote).
/// </summary>
public sealed class PopulationSelection
{
    private PopulationSelection(string name, string label, string treatmentVariable, IReadOnlyList<TreatmentArm> arms,
        IReadOnlyDictionary<string, TreatmentArm> armOfSubject, IReadOnlyList<string> warnings)
    {
        Name = name;
        Label = label;
        TreatmentVariable = treatmentVariable;
        Arms = arms;
        ArmOfSubject = armOfSubject;
        Warnings = warnings;
    }

    public string Name { get; }
    public string Label { get; }
    public string TreatmentVariable { get; }
    public IReadOnlyList<TreatmentArm> Arms { get; }
    public IReadOnlyDictionary<string, TreatmentArm> ArmOfSubject { get; }
    public IReadOnlyList<string> Warnings { get; }

    public TreatmentArm Control => Arms.First(a => a.IsControl);

    /// <summary>Number of subjects of the population in <paramref name="arm"/> (the column's N).</summary>
    public int Count(TreatmentArm arm) => _counts[arm];

    private Dictionary<TreatmentArm, int> _counts = [];

    public static PopulationSelection Select(StudySpec study, TableSpec table, StudyData data)
    {
        var population = study.Populations[table.Population];
        var adsl = data.SubjectLevel;
        var where = new SpecConditionText(population.Where, study.Source, $"/populations/{table.Population}/where").Compile(adsl);
        var subset = table.Subset is null ? null : new SpecConditionText(table.Subset, table.Source, "/subset").Compile(adsl);
        var treatmentPointer = population.Treatment is null ? "/treatment/variable" : $"/populations/{table.Population}/treatment";
        var orderPointer = population.Treatment is null ? "/treatment/order" : $"/populations/{table.Population}/order";
        var treatmentName = population.Treatment ?? study.Treatment.Variable;
        var orderName = population.Treatment is null ? study.Treatment.Order : population.Order;
        var treatment = FindVariable(adsl, treatmentName, study.Source, treatmentPointer);
        var order = orderName is null ? null : FindVariable(adsl, orderName, study.Source, orderPointer);
        var subjects = adsl.Get(AdamConformance.SubjectVariable);

        var armByValue = new Dictionary<string, (double Order, List<string> Subjects)>(StringComparer.Ordinal);
        // The arms of the population before the table's subset, with their order: an arm the subset empties keeps its column.
        var populationArms = new Dictionary<string, double>(StringComparer.Ordinal);
        var withoutArm = 0;
        for (var row = 0; row < adsl.RowCount; row++)
        {
            if (!where.Matches(row))
            {
                continue;
            }
            if (subset is not null && treatment.GetText(row) is { } populationArm && !populationArms.ContainsKey(populationArm))
            {
                var populationRank = order?.GetNumber(row) ?? double.NaN;
                populationArms[populationArm] = double.IsNaN(populationRank) ? double.MaxValue : populationRank;
            }
            if (subset is not null && !subset.Matches(row))
            {
                continue;
            }
            var value = treatment.GetText(row);
            if (value is null)
            {
                withoutArm++;
                continue;
            }
            if (!armByValue.TryGetValue(value, out var entry))
            {
                var rank = order?.GetNumber(row) ?? double.NaN;
                entry = (double.IsNaN(rank) ? double.MaxValue : rank, []);
                armByValue[value] = entry;
            }
            entry.Subjects.Add(subjects.GetText(row)!);
        }
        if (armByValue.Count == 0)
        {
            var condition = table.Subset is null ? population.Where : $"{population.Where}, subset {table.Subset}";
            throw new SpecException(table.Source.Problem(SpecProblemCode.NoSubjects, "/population",
                $"population '{table.Population}' ({condition}) has no subjects with a value of {treatment.Name} in {Path.GetFileName(adsl.File)}"));
        }
        if (!armByValue.ContainsKey(study.Treatment.Control))
        {
            throw new SpecException(study.Source.Problem(SpecProblemCode.UnknownDataValue, "/treatment/control",
                $"control arm '{study.Treatment.Control}' is not a value of {treatment.Name} in population '{table.Population}'{NearestName.Hint(study.Treatment.Control, armByValue.Keys.ToList())}"));
        }
        var emptyArms = EmptyArms(study, populationArms, armByValue);
        foreach (var (value, rank) in emptyArms)
        {
            armByValue[value] = (rank, []);
        }
        var arms = armByValue
            .OrderBy(a => a.Value.Order)
            .ThenBy(a => a.Key, StringComparer.Ordinal)
            .Select(a => new TreatmentArm(a.Key, study.Treatment.Labels?.GetValueOrDefault(a.Key) ?? a.Key, a.Value.Order,
                a.Key == study.Treatment.Control))
            .ToList();
        // Results keys come from the arm values (ResultKey); two arms with one key could not be told apart in results.json.
        if (arms.GroupBy(a => a.Key, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1) is { } clash)
        {
            throw new SpecException(study.Source.Problem(treatmentPointer,
                $"arms {string.Join(" and ", clash.Select(a => $"'{a.Value}'"))} of {treatment.Name} have the same results key '{clash.Key}'; recode them so that they differ in more than letter case, accents or punctuation"));
        }
        if (study.Treatment.Total && arms.Any(a => a.Key == ResultKey.Total))
        {
            throw new SpecException(study.Source.Problem("/treatment/total",
                $"an arm's results key is '{ResultKey.Total}', which the Total column uses; recode the arm or leave out the Total column"));
        }
        var armOfSubject = new Dictionary<string, TreatmentArm>(StringComparer.Ordinal);
        foreach (var arm in arms)
        {
            foreach (var subject in armByValue[arm.Value].Subjects)
            {
                armOfSubject[subject] = arm;
            }
        }
        var warnings = new List<string>();
        foreach (var arm in arms.Where(a => emptyArms.ContainsKey(a.Value)))
        {
            var selected = table.Subset is null ? $"population '{table.Population}'" : $"population '{table.Population}' with the subset {table.Subset}";
            warnings.Add($"arm {arm.Label} has no subjects in {selected}: its column shows N=0.");
        }
        if (withoutArm > 0)
        {
            warnings.Add($"{withoutArm} subject{(withoutArm == 1 ? "" : "s")} of the population with no value of {treatment.Name} {(withoutArm == 1 ? "is" : "are")} not counted.");
        }
        return new PopulationSelection(table.Population, population.Label, treatment.Name, arms, armOfSubject, warnings)
        {
            _counts = arms.ToDictionary(a => a, a => armByValue[a.Value].Subjects.Count),
        };
    }

    /// <summary>
    /// The arms with no subject selected that still get a column (N=0): those the study spec lists under treatment.arms
    /// (with their listed order) and those of the population that the table's subset leaves empty. An arm never
    /// disappears from a table without a word: reviewers expect every randomized arm.
    /// </summary>
    private static Dictionary<string, double> EmptyArms(StudySpec study, Dictionary<string, double> populationArms,
        Dictionary<string, (double Order, List<string> Subjects)> armByValue)
    {
        var empty = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var (value, rank) in populationArms.Where(a => !armByValue.ContainsKey(a.Key)))
        {
            empty[value] = rank;
        }
        foreach (var listed in study.Treatment.Arms ?? [])
        {
            if (!armByValue.ContainsKey(listed.Value))
            {
                empty.TryAdd(listed.Value, listed.Order);
            }
        }
        return empty;
    }

    /// <summary>What <see cref="Select"/> reads of ADSL: the subject, the population's and subset's conditions, the treatment and its order.</summary>
    public static VariableReads Reads(StudySpec study, TableSpec table, VariableReads reads)
    {
        var population = study.Populations[table.Population];
        return reads.Add(VariableReads.SubjectLevel, AdamConformance.SubjectVariable)
            .AddCondition(VariableReads.SubjectLevel, population.Where)
            .AddCondition(VariableReads.SubjectLevel, table.Subset)
            .Add(VariableReads.SubjectLevel, population.Treatment ?? study.Treatment.Variable)
            .Add(VariableReads.SubjectLevel, population.Treatment is null ? study.Treatment.Order : population.Order);
    }

    private static DataColumn FindVariable(Dataset adsl, string name, SpecSource source, string pointer) =>
        adsl.Find(name) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, pointer,
            $"ADSL ({Path.GetFileName(adsl.File)}) has no variable {name}{NearestName.Hint(name, adsl.VariableNames)}"));
}
