using OutputForge.Expressions;
using OutputForge.Spec;

namespace OutputForge.Analysis.StandIns;

/// <summary>
/// An ADSL variable summarized by level (demographics, disposition): its levels are the spec's list,
/// or the one level <see cref="ShellRecords.PlaceholderLevel"/>, given in turn to the subjects each
/// arm counts, so that every level has subjects in every arm; a numeric order variable ranks them as listed.
/// </summary>
public static class CategoricalStandIn
{
    public static void Add(ShellRecords records, string variable, IReadOnlyList<LevelSpec>? levels, string? orderBy, string? where)
    {
        var values = levels is { Count: > 0 } ? levels.Select(l => l.Value).ToList() : [ShellRecords.PlaceholderLevel];
        var counted = where is null ? records.Subjects.ToList() : Meet(records, where);
        foreach (var arm in counted.GroupBy(s => s.Arm))
        {
            foreach (var (subject, i) in arm.Select((s, i) => (s, i)))
            {
                var level = i % values.Count;
                records.SetIfAbsent(subject, variable, values[level], VariableKind.Text);
                if (orderBy is not null)
                {
                    records.SetIfAbsent(subject, orderBy, (level + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), VariableKind.Number);
                }
            }
        }
    }

    /// <summary>
    /// Gives every subject the values that make <paramref name="where"/> true, keeping the values it
    /// already has; returns the subjects for whom it then holds.
    /// </summary>
    public static List<ShellSubject> Meet(ShellRecords records, string where)
    {
        records.DeclareFrom(ShellRecords.SubjectLevel, where);
        var kinds = ConditionWitness.Literals(where);
        var met = new List<ShellSubject>();
        foreach (var subject in records.Subjects)
        {
            if (ConditionWitness.Find(where, true, subject.Values) is { } values)
            {
                foreach (var (name, value) in values)
                {
                    records.SetIfAbsent(subject, name, value, kinds.TryGetValue(name, out var l) ? ConditionWitness.KindOf(l) : VariableKind.Text);
                }
                met.Add(subject);
            }
        }
        return met;
    }
}
