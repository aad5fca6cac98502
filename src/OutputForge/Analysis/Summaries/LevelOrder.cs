using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Analysis.Summaries;

/// <summary>
/// Orders the levels of a categorical variable: as listed in the spec (values found in the data but
/// not listed follow, with a warning), by a numeric companion variable (e.g. AGEGR1N for AGEGR1),
/// by descending frequency, or alphabetically.
/// </summary>
public static class LevelOrder
{
    public static List<(string Value, string Label)> Arrange(CategoricalRequest request, Dataset adsl, IReadOnlyList<int> rows,
        DataColumn variable, SpecSource source, List<string> warnings)
    {
        var observed = rows.Select(variable.GetText).OfType<string>().Distinct(StringComparer.Ordinal).ToList();
        if (request.Levels is { } listed)
        {
            var duplicate = listed.GroupBy(l => l.Value, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
            if (duplicate is not null)
            {
                throw new SpecException(source.Problem(request.Pointer + "/levels", $"level '{duplicate.Key}' is listed twice"));
            }
            var result = listed.Select(l => (l.Value, l.Label ?? l.Value)).ToList();
            var unlisted = observed.Where(v => listed.All(l => l.Value != v)).Order(StringComparer.Ordinal).ToList();
            foreach (var value in unlisted)
            {
                warnings.Add($"{variable.Name} value '{value}' is not in the spec's levels; it is shown after them{NearestName.Hint(value, listed.Select(l => l.Value).ToList())}.");
                result.Add((value, value));
            }
            return result;
        }
        if (request.OrderBy is { } orderName)
        {
            var order = adsl.Find(orderName) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, request.Pointer + "/orderBy",
                $"ADSL has no variable {orderName}{NearestName.Hint(orderName, adsl.VariableNames)}"));
            if (order.Kind != Expressions.VariableKind.Number)
            {
                throw new SpecException(source.Problem(request.Pointer + "/orderBy", $"{orderName} is not numeric, so it cannot order the levels"));
            }
            var rank = new Dictionary<string, double>(StringComparer.Ordinal);
            foreach (var row in rows)
            {
                if (variable.GetText(row) is not { } value || double.IsNaN(order.GetNumber(row)))
                {
                    continue;
                }
                var number = order.GetNumber(row);
                if (rank.TryGetValue(value, out var seen) && seen != number)
                {
                    warnings.Add($"{variable.Name} value '{value}' has more than one {orderName} value; the smallest orders it.");
                    number = Math.Min(seen, number);
                }
                rank[value] = number;
            }
            return observed
                .OrderBy(v => rank.TryGetValue(v, out var r) ? r : double.MaxValue)
                .ThenBy(v => v, StringComparer.Ordinal)
                .Select(v => (v, v)).ToList();
        }
        if (request.Order == LevelSorting.Frequency)
        {
            var counts = rows.Select(variable.GetText).OfType<string>().GroupBy(v => v, StringComparer.Ordinal)
                .ToDictionary(g => g.Key, g => g.Count(), StringComparer.Ordinal);
            return observed.OrderByDescending(v => counts[v]).ThenBy(v => v, StringComparer.Ordinal).Select(v => (v, v)).ToList();
        }
        return observed.Order(StringComparer.Ordinal).Select(v => (v, v)).ToList();
    }
}
