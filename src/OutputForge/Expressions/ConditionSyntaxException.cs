namespace OutputForge.Expressions;

/// <summary>
/// A condition that cannot be read or does not fit the data. <see cref="Position"/> is the
/// 1-based character position in the condition text, so the message can point at the problem.
/// </summary>
public sealed class ConditionSyntaxException(string message, int position) : Exception(message)
{
    public int Position { get; } = position;
}
