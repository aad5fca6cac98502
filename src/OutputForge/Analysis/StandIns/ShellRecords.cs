using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Spec;

namespace OutputForge.Analysis.StandIns;

/// <summary>
/// The stand-in study a mock shell is laid out from, while it is being made: the invented subjects
/// (ADSL) that the table's population and subset select, and the records each table kind's
/// <see cref="IShellStandIn"/> adds to its own datasets. No value in here is ever shown: the shell
/// replaces every number by a placeholder, and the stand-ins choose text values (levels, terms,
/// visits) from the spec or as <see cref="PlaceholderLevel"/>.
/// </summary>
public sealed class ShellRecords
{
    /// <summary>The label of a row whose value only the data will give (a level, a class, a term).</summary>
    public const string PlaceholderLevel = "xxxxxxxx";

    public const string SubjectLevel = "adsl";

    /// <summary>Ten per arm: no expected count is below 5 when split five and five, and no statistic is inestimable.</summary>
    public const int SubjectsPerArm = 10;

    private readonly Dictionary<string, List<Dictionary<string, string?>>> _records = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Dictionary<string, VariableKind>> _kinds = new(StringComparer.Ordinal);

    public ShellRecords(StudySpec study, TableSpec table, IReadOnlyList<ShellSubject> subjects)
    {
        Study = study;
        Table = table;
        Subjects = subjects;
    }

    public StudySpec Study { get; }

    public TableSpec Table { get; }

    public IReadOnlyList<ShellSubject> Subjects { get; }

    /// <summary>What the shell assumes for lack of data (e.g. the decimals of a variable), for the run log.</summary>
    public List<string> Assumptions { get; } = [];

    /// <summary>Declares the kind of a variable of <paramref name="dataset"/> (its values are typed as the dataset reader would type them).</summary>
    public void Declare(string dataset, string variable, VariableKind kind)
    {
        if (!_kinds.TryGetValue(dataset, out var kinds))
        {
            _kinds[dataset] = kinds = new Dictionary<string, VariableKind>(StringComparer.OrdinalIgnoreCase);
        }
        kinds[variable] = kind;
    }

    /// <summary>Declares every variable of a condition with the kind of the literals it is compared with, unless already declared.</summary>
    public void DeclareFrom(string dataset, string condition)
    {
        foreach (var (variable, literals) in ConditionWitness.Literals(condition))
        {
            if (!_kinds.TryGetValue(dataset, out var kinds) || !kinds.ContainsKey(variable))
            {
                Declare(dataset, variable, ConditionWitness.KindOf(literals));
            }
        }
    }

    /// <summary>
    /// Sets an ADSL value of a subject that has none yet (the population's own values are never
    /// overwritten), declaring the variable's kind unless a condition already did.
    /// </summary>
    public void SetIfAbsent(ShellSubject subject, string variable, string? value, VariableKind kind)
    {
        if (!_kinds.TryGetValue(SubjectLevel, out var kinds) || !kinds.ContainsKey(variable))
        {
            Declare(SubjectLevel, variable, kind);
        }
        subject.Values.TryAdd(variable, value);
    }

    /// <summary>Adds a record to <paramref name="dataset"/>; <paramref name="values"/> holds USUBJID.</summary>
    public void AddRecord(string dataset, IReadOnlyDictionary<string, string?> values)
    {
        if (!_records.TryGetValue(dataset, out var rows))
        {
            _records[dataset] = rows = [];
        }
        rows.Add(new Dictionary<string, string?>(values, StringComparer.OrdinalIgnoreCase));
    }

    /// <summary>
    /// Values that make <paramref name="condition"/> true with <paramref name="fixedValues"/> kept,
    /// the condition's variables declared in <paramref name="dataset"/>; a located spec error when none exist.
    /// </summary>
    public IReadOnlyDictionary<string, string?> Witness(string condition, IReadOnlyDictionary<string, string?> fixedValues, string dataset,
        SpecSource source, string pointer)
    {
        DeclareFrom(dataset, condition);
        return ConditionWitness.Find(condition, true, fixedValues) ?? throw new SpecException(source.Problem(pointer,
            $"no stand-in record meets \"{condition}\" with the literals it names, so the shell cannot be laid out; simplify the condition"));
    }

    /// <summary>A number as the data would write it, with <paramref name="decimals"/> decimals.</summary>
    public static string Number(double value, int decimals) =>
        value.ToString("F" + Math.Max(0, decimals).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>The stand-in study: ADSL from the subjects, the records added, and every other dataset of the study spec empty.</summary>
    public StudyData ToStudyData()
    {
        var datasets = new List<Dataset> { Build(SubjectLevel, Subjects.Select(s => s.Values).ToList()) };
        foreach (var (name, rows) in _records.Where(r => r.Key != SubjectLevel))
        {
            datasets.Add(Build(name, rows));
        }
        foreach (var name in Study.Data.Datasets.Keys.Where(n => datasets.All(d => d.Name != n)))
        {
            datasets.Add(Build(name, []));
        }
        return StudyData.FromDatasets("(mock shell: no data)", datasets);
    }

    private Dataset Build(string name, List<Dictionary<string, string?>> rows)
    {
        const string subject = AdamConformance.SubjectVariable;
        var kinds = _kinds.GetValueOrDefault(name);
        var names = new List<string> { subject };
        names.AddRange(rows.SelectMany(r => r.Keys).Where(k => !k.Equals(subject, StringComparison.OrdinalIgnoreCase))
            .Distinct(StringComparer.OrdinalIgnoreCase));
        var columns = names.Select(n => StandInColumn.Create(n,
            kinds is not null && kinds.TryGetValue(n, out var kind) ? kind : VariableKind.Text,
            rows.Select(r => r.GetValueOrDefault(n)).ToList())).ToList();
        return new Dataset(name, $"{name} (mock shell)", rows.Count, columns, rows.Select((_, i) => i + 2).ToList());
    }
}
