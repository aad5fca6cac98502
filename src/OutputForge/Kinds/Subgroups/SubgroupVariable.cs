using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Naming;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// One subgroup variable resolved against ADSL: its levels in print order with their labels, and the
/// level of each subject of the population. Levels come from the spec in its order; otherwise from the
/// data, ordered by the numeric companion variable of the ADaM convention (AGEGR1 -> AGEGR1N) when ADSL
/// has it, else by value (ordinal). Subjects with no value, or a value the spec does not list, belong
/// to no level and are counted for the warnings.
/// </summary>
internal sealed record SubgroupVariable(
    string Name,
    string Label,
    IReadOnlyList<SubgroupLevel> Levels,
    IReadOnlyDictionary<string, int> LevelOfSubject,
    int WithoutValue,
    IReadOnlyList<string> UnlistedValues,
    int WithUnlistedValue,
    string Order)
{
    /// <summary><see cref="Order"/> of levels in the spec's order; otherwise <see cref="AlphabeticalOrder"/> or the name of the numeric variable that orders them.</summary>
    public const string SpecOrder = "spec";

    public const string AlphabeticalOrder = "alphabetical";

    /// <summary>The suffix of a variable's numeric companion, which orders its levels (ADaM: AGEGR1 -> AGEGR1N).</summary>
    public const string OrderSuffix = "N";

    public static SubgroupVariable Resolve(SubgroupVariableSpec spec, int index, Dataset adsl, IEnumerable<string> subjects, SpecSource source)
    {
        var pointer = $"/subgroups/variables/{index}";
        var column = adsl.Find(spec.Variable) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, pointer + "/variable",
            $"ADSL ({Path.GetFileName(adsl.File)}) has no variable {spec.Variable}{NearestName.Hint(spec.Variable, adsl.VariableNames)}"));
        var ids = adsl.Get(AdamConformance.SubjectVariable);
        var rowOfSubject = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var row = 0; row < adsl.RowCount; row++)
        {
            rowOfSubject[ids.GetText(row)!] = row;
        }
        var valueOfSubject = subjects.ToDictionary(s => s, s => rowOfSubject.TryGetValue(s, out var r) ? column.GetText(r) : null, StringComparer.Ordinal);
        var present = valueOfSubject.Values.Where(v => v is not null).Select(v => v!).Distinct(StringComparer.Ordinal).ToList();

        List<SubgroupLevel> levels;
        string orderNote;
        if (spec.Levels is { } listed)
        {
            var known = column.DistinctValues();
            for (var i = 0; i < listed.Count; i++)
            {
                if (!known.Contains(listed[i].Value, StringComparer.Ordinal))
                {
                    throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, $"{pointer}/levels/{i}/value",
                        $"'{listed[i].Value}' is not a value of {column.Name} in ADSL{NearestName.Hint(listed[i].Value, known.ToList())}"));
                }
            }
            if (listed.GroupBy(l => l.Value, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1) is { } twice)
            {
                throw new SpecException(source.Problem(pointer + "/levels", $"level '{twice.Key}' of {column.Name} is listed more than once"));
            }
            levels = listed.Select(l => new SubgroupLevel(l.Value, l.Label ?? l.Value)).ToList();
            orderNote = SpecOrder;
        }
        else if (adsl.Find(column.Name + OrderSuffix) is { Kind: VariableKind.Number } companion)
        {
            var rank = new Dictionary<string, double>(StringComparer.Ordinal);
            for (var row = 0; row < adsl.RowCount; row++)
            {
                if (column.GetText(row) is { } v && !rank.ContainsKey(v) && !double.IsNaN(companion.GetNumber(row)))
                {
                    rank[v] = companion.GetNumber(row);
                }
            }
            levels = present.OrderBy(v => rank.GetValueOrDefault(v, double.MaxValue)).ThenBy(v => v, StringComparer.Ordinal)
                .Select(v => new SubgroupLevel(v, v)).ToList();
            orderNote = companion.Name;
        }
        else
        {
            levels = present.Order(StringComparer.Ordinal).Select(v => new SubgroupLevel(v, v)).ToList();
            orderNote = AlphabeticalOrder;
        }

        var index0 = levels.Select((l, i) => (l.Value, i)).ToDictionary(p => p.Value, p => p.i, StringComparer.Ordinal);
        var levelOfSubject = new Dictionary<string, int>(StringComparer.Ordinal);
        int without = 0, unlisted = 0;
        var unlistedValues = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var (subject, value) in valueOfSubject)
        {
            if (value is null)
            {
                without++;
            }
            else if (index0.TryGetValue(value, out var i))
            {
                levelOfSubject[subject] = i;
            }
            else
            {
                unlisted++;
                unlistedValues.Add(value);
            }
        }
        return new SubgroupVariable(column.Name, spec.Label ?? column.Label ?? column.Name, levels, levelOfSubject, without, unlistedValues.ToList(), unlisted, orderNote);
    }

    /// <summary>The warnings about subjects that belong to no level.</summary>
    public IEnumerable<ResultNote> Warnings()
    {
        var subject = new NoteSubject(What: Label, Parameter: Name);
        if (WithoutValue > 0)
        {
            yield return ResultNote.Warning(NoteKind.InNoSubgroup, subject, ("subjects", WithoutValue));
        }
        if (WithUnlistedValue > 0)
        {
            yield return ResultNote.Warning(NoteKind.InNoSubgroup, subject, ("subjects", WithUnlistedValue), ("unlistedValues", UnlistedValues.ToList()));
        }
    }
}

/// <summary>A level of a subgroup variable: its value in ADSL and its printed label.</summary>
internal sealed record SubgroupLevel(string Value, string Label);
