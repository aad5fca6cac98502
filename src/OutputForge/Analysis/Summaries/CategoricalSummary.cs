using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// n (%) of subjects per level of an ADSL variable, per column; percentages are of the column's N
/// (all subjects of the population in that column), also when a condition narrows who is counted.
/// Row keys (<see cref="ResultKey"/>) are "{key}/{value}" and "{key}/missing".
/// </summary>
public static class CategoricalSummary
{
    public static CategoricalBlock Summarize(CategoricalRequest request, Dataset adsl, IReadOnlyList<(int Row, TreatmentArm Arm)> subjects,
        IReadOnlyList<TreatmentArm> arms, IReadOnlyList<SummaryColumn> columns, PercentDisplaySpec percent, SpecSource source, int indent)
    {
        var variable = adsl.Find(request.Variable) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, request.Pointer + "/variable",
            $"ADSL has no variable {request.Variable}{NearestName.Hint(request.Variable, adsl.VariableNames)}"));
        var where = request.Where is null ? null : new SpecConditionText(request.Where, source, request.Pointer + "/where").Compile(adsl);
        var counted = subjects.Where(s => where is null || where.Matches(s.Row)).ToList();
        var warnings = new List<string>();
        var levels = LevelOrder.Arrange(request, adsl, counted.Select(s => s.Row).ToList(), variable, source, warnings);

        // One pass sorts the counted subjects by their value (in subject order), rather than one scan per level.
        var byValue = new Dictionary<string, List<(int Row, TreatmentArm Arm)>>(StringComparer.Ordinal);
        foreach (var subject in counted)
        {
            if (variable.GetText(subject.Row) is not { } text) continue;
            if (!byValue.TryGetValue(text, out var withValue))
            {
                withValue = [];
                byValue[text] = withValue;
            }
            withValue.Add(subject);
        }

        var rows = new List<ResultRow>();
        var table = new int[levels.Count, arms.Count];
        for (var i = 0; i < levels.Count; i++)
        {
            var value = levels[i].Value;
            var inLevel = value is null ? counted.Where(s => variable.GetText(s.Row) is null).ToList() : byValue.GetValueOrDefault(value) ?? [];
            for (var j = 0; j < arms.Count; j++)
            {
                table[i, j] = inLevel.Count(s => s.Arm == arms[j]);
            }
            if (inLevel.Count == 0)
            {
                warnings.Add($"{variable.Name} level '{value}' has no subjects in this population.");
            }
            rows.Add(new ResultRow(ResultKey.Of(request.Key, value ?? ResultKey.Missing), levels[i].Label, indent,
                columns.Select(c => CountCells.CountPercent(c.Key, inLevel.Count(s => c.Holds(s.Arm)), c.N, percent)).ToList()));
        }
        var missing = counted.Where(s => variable.IsMissing(s.Row)).ToList();
        if (request.Missing)
        {
            rows.Add(new ResultRow(ResultKey.Below(ResultKey.Part(request.Key), ResultKey.Missing), "Missing", indent,
                columns.Select(c => CountCells.CountPercent(c.Key, missing.Count(s => c.Holds(s.Arm)), c.N, percent)).ToList()));
        }
        else if (missing.Count > 0)
        {
            warnings.Add($"{missing.Count} subject{(missing.Count == 1 ? "" : "s")} with no {variable.Name} {(missing.Count == 1 ? "is" : "are")} not shown (set \"missing\": true for a Missing row).");
        }
        return new CategoricalBlock(rows, table, warnings);
    }
}
