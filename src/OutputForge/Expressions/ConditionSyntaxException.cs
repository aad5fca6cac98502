namespace OutputForge.Expressions;

/// <summary>
/// A condition that cannot be read or does not fit the data. <see cref="Position"/> is the
/// 1-based character position in the condition text, so the message can point at the problem.
/// </summary>
public sealed class ConditionSyntaxException(string message, int position, ConditionProblem problem = ConditionProblem.Syntax) : Exception(message)
{
    public int Position { get; } = position;

    /// <summary>What is wrong, for whoever turns the exception into a located problem with a hint.</summary>
    public ConditionProblem Problem { get; } = problem;
}
