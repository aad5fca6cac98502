namespace OutputForge.Expressions;

/// <summary>The parsed form of a condition, before it is bound to a dataset.</summary>
public abstract record ConditionNode(int Position);

public sealed record AndNode(ConditionNode Left, ConditionNode Right, int Position) : ConditionNode(Position);

public sealed record OrNode(ConditionNode Left, ConditionNode Right, int Position) : ConditionNode(Position);

public sealed record NotNode(ConditionNode Operand, int Position) : ConditionNode(Position);

public enum ComparisonOperator { Equal, NotEqual, Less, LessOrEqual, Greater, GreaterOrEqual }

/// <summary>A literal in a condition: either quoted text or a number.</summary>
public sealed record Literal(string? Text, double? Number, int Position)
{
    public bool IsText => Text is not null;

    public override string ToString() => IsText ? $"'{Text}'" : Number!.Value.ToString(System.Globalization.CultureInfo.InvariantCulture);
}

public sealed record ComparisonNode(string Variable, ComparisonOperator Operator, Literal Value, int Position) : ConditionNode(Position);

public sealed record InListNode(string Variable, IReadOnlyList<Literal> Values, bool Negated, int Position) : ConditionNode(Position);

public sealed record MissingTestNode(string Variable, bool Negated, int Position) : ConditionNode(Position);
