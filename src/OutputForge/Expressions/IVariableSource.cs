namespace OutputForge.Expressions;

/// <summary>The kind of values a variable holds, as far as conditions care.</summary>
public enum VariableKind { Number, Text, Date }

/// <summary>Row-wise access to one variable, for evaluating conditions.</summary>
public interface IVariable
{
    string Name { get; }
    VariableKind Kind { get; }
    /// <summary>Why the variable has its kind, where that may surprise (e.g. "'abc' on line 5"); null otherwise.</summary>
    string? KindNote => null;
    /// <summary>
    /// The first non-missing value that <paramref name="accept"/> refuses, described with its place in the data (e.g.
    /// "'01MAR2025' on line 5 of adsl.csv"); null when every value is accepted.
    /// </summary>
    string? FirstValueNot(Func<string, bool> accept) => null;
    bool IsMissing(int row);
    /// <summary>The value as written in the data (for text comparisons); null when missing.</summary>
    string? GetText(int row);
    /// <summary>The numeric value (dates as day numbers); NaN when missing or not numeric.</summary>
    double GetNumber(int row);
}

/// <summary>The variables a condition may name (e.g. the columns of one dataset).</summary>
public interface IVariableSource
{
    /// <summary>Name used in messages, e.g. the dataset name.</summary>
    string SourceName { get; }
    IReadOnlyCollection<string> VariableNames { get; }
    IVariable? FindVariable(string name);
}
