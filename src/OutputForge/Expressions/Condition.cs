using System.Globalization;
using OutputForge.Naming;

namespace OutputForge.Expressions;

/// <summary>
/// A condition bound to one set of variables and compiled to a row predicate.
/// Rule for missing values: a comparison or list test on a missing value is false (whatever the
/// operator), so <c>AESER != 'Y'</c> does not select records with AESER missing; use
/// <c>is null</c> / <c>is not null</c> to test for them.
/// </summary>
public sealed class Condition
{
    private readonly Func<int, bool> _predicate;

    private Condition(string text, Func<int, bool> predicate, IReadOnlyCollection<string> variables)
    {
        Text = text;
        _predicate = predicate;
        Variables = variables;
    }

    public string Text { get; }

    /// <summary>The variables the condition reads.</summary>
    public IReadOnlyCollection<string> Variables { get; }

    public bool Matches(int row) => _predicate(row);

    /// <summary>Parses and binds <paramref name="text"/>; throws <see cref="ConditionSyntaxException"/> with the position of the problem.</summary>
    public static Condition Compile(string text, IVariableSource source)
    {
        var node = ConditionParser.Parse(text);
        var used = new SortedSet<string>(StringComparer.Ordinal);
        var predicate = Bind(node, source, used);
        return new Condition(text, predicate, used);
    }

    private static Func<int, bool> Bind(ConditionNode node, IVariableSource source, ISet<string> used)
    {
        switch (node)
        {
            case AndNode and:
                {
                    var left = Bind(and.Left, source, used);
                    var right = Bind(and.Right, source, used);
                    return row => left(row) && right(row);
                }
            case OrNode or:
                {
                    var left = Bind(or.Left, source, used);
                    var right = Bind(or.Right, source, used);
                    return row => left(row) || right(row);
                }
            case NotNode not:
                {
                    var operand = Bind(not.Operand, source, used);
                    return row => !operand(row);
                }
            case MissingTestNode missing:
                {
                    var variable = Resolve(missing.Variable, missing.Position, source, used);
                    return missing.Negated ? row => !variable.IsMissing(row) : variable.IsMissing;
                }
            case InListNode list:
                {
                    var variable = Resolve(list.Variable, list.Position, source, used);
                    var tests = list.Values.Select(v => BindComparison(variable, ComparisonOperator.Equal, v)).ToArray();
                    bool Any(int row)
                    {
                        foreach (var test in tests)
                        {
                            if (test(row))
                            {
                                return true;
                            }
                        }
                        return false;
                    }
                    return list.Negated ? row => !variable.IsMissing(row) && !Any(row) : Any;
                }
            case ComparisonNode comparison:
                {
                    var variable = Resolve(comparison.Variable, comparison.Position, source, used);
                    return BindComparison(variable, comparison.Operator, comparison.Value);
                }
            default:
                throw new InvalidOperationException($"unknown condition node {node.GetType().Name}");
        }
    }

    private static IVariable Resolve(string name, int position, IVariableSource source, ISet<string> used)
    {
        var variable = source.FindVariable(name)
            ?? throw new ConditionSyntaxException(
                $"{source.SourceName} has no variable {name}{NearestName.Hint(name, source.VariableNames)}", position, ConditionProblem.UnknownVariable);
        used.Add(variable.Name);
        return variable;
    }

    private static Func<int, bool> BindComparison(IVariable variable, ComparisonOperator op, Literal literal)
    {
        if (literal.IsText && variable.Kind != VariableKind.Date && IsoDateText.IsDate(literal.Text!))
        {
            return CompareWithDate(variable, op, literal);
        }
        if (literal.IsText)
        {
            return variable.Kind switch
            {
                VariableKind.Date => CompareNumbers(variable, op, ParseDate(variable, literal)),
                VariableKind.Number when op is not (ComparisonOperator.Equal or ComparisonOperator.NotEqual) =>
                    throw new ConditionSyntaxException(
                        $"{variable.Name} is numeric: compare it with a number, without quotes", literal.Position),
                _ => CompareTexts(variable, op, literal.Text!),
            };
        }
        if (variable.Kind == VariableKind.Text)
        {
            var evidence = variable.KindNote is null ? string.Empty : $" ({variable.KindNote} is not a number)";
            throw new ConditionSyntaxException(
                $"{variable.Name} holds text{evidence}: put the value in quotes ('{literal}')", literal.Position);
        }
        if (variable.Kind == VariableKind.Date)
        {
            throw new ConditionSyntaxException(
                $"{variable.Name} is a date: compare it with a quoted ISO 8601 date such as '2026-01-31'", literal.Position);
        }
        return CompareNumbers(variable, op, literal.Number!.Value);
    }

    /// <summary>
    /// A variable that is not a date column compared with an ISO date: a text column of ISO 8601 dates and date-times
    /// compares as text (chronological for that form); a value in any other form, which would compare wrongly and
    /// silently drop or keep its record, is refused with its place in the data.
    /// </summary>
    private static Func<int, bool> CompareWithDate(IVariable variable, ComparisonOperator op, Literal literal)
    {
        if (variable.Kind == VariableKind.Number)
        {
            throw new ConditionSyntaxException(
                $"{variable.Name} holds numbers, not dates: it cannot be compared with the date '{literal.Text}'", literal.Position);
        }
        if (variable.FirstValueNot(IsoDateText.IsDateOrDateTime) is { } value)
        {
            throw new ConditionSyntaxException(
                $"{variable.Name} is compared with the date '{literal.Text}', but {value} is not an ISO 8601 date (expected YYYY-MM-DD, or a partial date or date-time such as 2025-03 or 2025-03-01T10:00); correct the data",
                literal.Position);
        }
        return CompareTexts(variable, op, literal.Text!);
    }

    private static double ParseDate(IVariable variable, Literal literal)
    {
        if (!DateOnly.TryParseExact(literal.Text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
        {
            throw new ConditionSyntaxException(
                $"{variable.Name} is a date: '{literal.Text}' is not an ISO 8601 date (YYYY-MM-DD)", literal.Position);
        }
        return date.DayNumber;
    }

    private static Func<int, bool> CompareTexts(IVariable variable, ComparisonOperator op, string value)
    {
        // The data's trailing blanks are dropped when read (transport padding); so are the literal's, so that
        // 'Placebo ' and 'Placebo' are the same value on both sides.
        value = value.TrimEnd(' ');
        return row =>
        {
            var actual = variable.GetText(row);
            if (actual is null)
            {
                return false;
            }
            return Holds(op, string.CompareOrdinal(actual, value));
        };
    }

    private static Func<int, bool> CompareNumbers(IVariable variable, ComparisonOperator op, double value)
    {
        return row =>
        {
            var actual = variable.GetNumber(row);
            if (double.IsNaN(actual))
            {
                return false;
            }
            return Holds(op, actual.CompareTo(value));
        };
    }

    private static bool Holds(ComparisonOperator op, int order) => op switch
    {
        ComparisonOperator.Equal => order == 0,
        ComparisonOperator.NotEqual => order != 0,
        ComparisonOperator.Less => order < 0,
        ComparisonOperator.LessOrEqual => order <= 0,
        ComparisonOperator.Greater => order > 0,
        ComparisonOperator.GreaterOrEqual => order >= 0,
        _ => false,
    };
}
