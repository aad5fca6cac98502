using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// The stratum of every subject of the population: the values of the stratification variables of ADSL,
/// cross-classified (joined with " / " in the order the spec lists them). Also lists the combinations of
/// values that no subject of the population has (empty strata) and the subjects without a value.
/// </summary>
public sealed class ResponderStrata
{
    private ResponderStrata(IReadOnlyList<string> variables, IReadOnlyDictionary<string, string> stratumOfSubject,
        IReadOnlyList<string> levels, IReadOnlyList<string> emptyCombinations, int withoutValue)
    {
        Variables = variables;
        StratumOfSubject = stratumOfSubject;
        Levels = levels;
        EmptyCombinations = emptyCombinations;
        WithoutValue = withoutValue;
    }

    public IReadOnlyList<string> Variables { get; }

    /// <summary>The stratum of each subject that has a value of every variable.</summary>
    public IReadOnlyDictionary<string, string> StratumOfSubject { get; }

    /// <summary>The strata with at least one subject of the population, in ordinal order.</summary>
    public IReadOnlyList<string> Levels { get; }

    /// <summary>Combinations of observed values of the variables that no subject of the population has.</summary>
    public IReadOnlyList<string> EmptyCombinations { get; }

    /// <summary>Subjects of the population left out of the stratified analysis for a missing value.</summary>
    public int WithoutValue { get; }

    /// <summary>"STRAT1R / STRAT2R", the order in which a stratum's values are written.</summary>
    public string VariablesText => string.Join(" / ", Variables);

    public static ResponderStrata Build(ResponderStratification spec, PopulationSelection selection, StudyData data, SpecSource source)
    {
        var adsl = data.SubjectLevel;
        var names = adsl.VariableNames;
        var columns = spec.Strata.Select((name, i) => adsl.Find(name) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, $"/responders/stratified/strata/{i}",
            $"ADSL ({Path.GetFileName(adsl.File)}) has no variable {name}, which this key stratifies by{NearestName.Hint(name, names)}"))).ToList();
        var subjects = adsl.Get(AdamConformance.SubjectVariable);
        var stratumOfSubject = new Dictionary<string, string>(StringComparer.Ordinal);
        var observed = columns.Select(_ => new SortedSet<string>(StringComparer.Ordinal)).ToList();
        var withoutValue = 0;
        for (var row = 0; row < adsl.RowCount; row++)
        {
            var subject = subjects.GetText(row)!;
            if (!selection.ArmOfSubject.ContainsKey(subject))
            {
                continue;
            }
            var values = columns.Select(c => c.GetText(row)).ToList();
            if (values.Any(v => v is null))
            {
                withoutValue++;
                continue;
            }
            for (var i = 0; i < values.Count; i++)
            {
                observed[i].Add(values[i]!);
            }
            stratumOfSubject[subject] = string.Join(" / ", values);
        }
        var levels = stratumOfSubject.Values.Distinct().OrderBy(v => v, StringComparer.Ordinal).ToList();
        var combinations = observed.Aggregate((IEnumerable<string>)[string.Empty],
            (prefix, values) => prefix.SelectMany(p => values.Select(v => p.Length == 0 ? v : $"{p} / {v}")));
        var empty = combinations.Where(c => !levels.Contains(c, StringComparer.Ordinal)).ToList();
        return new ResponderStrata(spec.Strata, stratumOfSubject, levels, empty, withoutValue);
    }
}
