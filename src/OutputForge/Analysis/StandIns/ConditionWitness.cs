using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;

namespace OutputForge.Analysis.StandIns;

/// <summary>
/// Finds values of a condition's variables that make it true (or false), by trying the literals
/// the condition itself names (and, for numbers, one above and one below, and missing) in every
/// combination, each evaluated by the real condition code. Mock shells use these values to build
/// stand-in records that a population, subset, record selection or response definition selects.
/// </summary>
public static class ConditionWitness
{
    private const int MaxCombinations = 20000;

    /// <summary>A value for every variable the condition names, or null when no combination of its literals gives <paramref name="wanted"/>.</summary>
    /// <param name="fixedValues">Variables whose values are already decided (e.g. the treatment variable), by name (case-insensitive).</param>
    public static IReadOnlyDictionary<string, string?>? Find(string condition, bool wanted, IReadOnlyDictionary<string, string?> fixedValues)
    {
        var candidates = new Dictionary<string, List<Literal>>(StringComparer.OrdinalIgnoreCase);
        Collect(ConditionParser.Parse(condition), candidates);
        var free = candidates.Keys.Where(v => !fixedValues.ContainsKey(v)).ToList();
        var options = free.Select(v => Options(candidates[v])).ToList();
        var combinations = options.Aggregate(1L, (product, o) => Math.Min(product * o.Count, long.MaxValue / 64));
        if (combinations > MaxCombinations)
        {
            return null;
        }
        var choice = new int[free.Count];
        for (long n = 0; n < combinations; n++)
        {
            var values = new Dictionary<string, string?>(fixedValues, StringComparer.OrdinalIgnoreCase);
            var rest = n;
            for (var i = 0; i < free.Count; i++)
            {
                choice[i] = (int)(rest % options[i].Count);
                rest /= options[i].Count;
                values[free[i]] = options[i][choice[i]];
            }
            if (Holds(condition, OneRow(values, candidates)) == wanted)
            {
                return values;
            }
        }
        return null;
    }

    /// <summary>Whether the condition holds on the one-row stand-in; a fixed value of the wrong kind for a comparison counts as not holding.</summary>
    private static bool? Holds(string condition, Dataset row)
    {
        try
        {
            return Condition.Compile(condition, row).Matches(0);
        }
        catch (ConditionSyntaxException)
        {
            return null;
        }
    }

    /// <summary>The kind a stand-in column of <paramref name="name"/> gets from the literals it is compared with.</summary>
    public static VariableKind KindOf(IReadOnlyList<Literal> literals) =>
        literals.Count > 0 && literals.All(l => l.Number is not null) ? VariableKind.Number
        : literals.Any(l => l.Text is { } t && IsDate(t)) ? VariableKind.Date
        : VariableKind.Text;

    /// <summary>The literals each variable is compared with, by variable.</summary>
    public static Dictionary<string, List<Literal>> Literals(string condition)
    {
        var candidates = new Dictionary<string, List<Literal>>(StringComparer.OrdinalIgnoreCase);
        Collect(ConditionParser.Parse(condition), candidates);
        return candidates;
    }

    private static void Collect(ConditionNode node, Dictionary<string, List<Literal>> candidates)
    {
        switch (node)
        {
            case AndNode and:
                Collect(and.Left, candidates);
                Collect(and.Right, candidates);
                break;
            case OrNode or:
                Collect(or.Left, candidates);
                Collect(or.Right, candidates);
                break;
            case NotNode not:
                Collect(not.Operand, candidates);
                break;
            case ComparisonNode comparison:
                Add(candidates, comparison.Variable, [comparison.Value]);
                break;
            case InListNode list:
                Add(candidates, list.Variable, list.Values);
                break;
            case MissingTestNode missing:
                Add(candidates, missing.Variable, []);
                break;
        }
    }

    private static void Add(Dictionary<string, List<Literal>> candidates, string variable, IEnumerable<Literal> literals)
    {
        if (!candidates.TryGetValue(variable, out var list))
        {
            candidates[variable] = list = [];
        }
        list.AddRange(literals);
    }

    /// <summary>Values to try: each literal as written (numbers also one above and below), then missing; a variable only tested for missingness gets "Y".</summary>
    private static List<string?> Options(List<Literal> literals)
    {
        var options = new List<string?>();
        foreach (var literal in literals)
        {
            if (literal.Number is { } number)
            {
                options.AddRange([Text(number), Text(number + 1), Text(number - 1)]);
            }
            else if (literal.Text is { } text)
            {
                options.Add(text);
                if (IsDate(text))
                {
                    var date = DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);
                    options.AddRange([date.AddDays(1).ToString("yyyy-MM-dd", CultureInfo.InvariantCulture), date.AddDays(-1).ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)]);
                }
            }
        }
        if (options.Count == 0)
        {
            options.Add("Y");
        }
        options.Add(null);
        return options.Distinct().ToList();
    }

    private static string Text(double number) => number.ToString("R", CultureInfo.InvariantCulture);

    private static bool IsDate(string text) =>
        text.Length == 10 && DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _);

    private static Dataset OneRow(IReadOnlyDictionary<string, string?> values, Dictionary<string, List<Literal>> literals)
    {
        var columns = values.Select(v => StandInColumn.Create(v.Key,
            literals.TryGetValue(v.Key, out var l) ? KindOf(l) : VariableKind.Text, [v.Value])).ToList();
        return new Dataset("condition", "condition", 1, columns, [2]);
    }
}
