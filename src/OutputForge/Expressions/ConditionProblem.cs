namespace OutputForge.Expressions;

/// <summary>What is wrong with a condition: its syntax, a variable the data lacks, or the old missing-value test.</summary>
public enum ConditionProblem
{
    Syntax,
    UnknownVariable,
    MissingValueTest,
}
