namespace OutputForge.Expressions;

/// <summary>The kind of values a variable holds, as far as conditions care.</summary>
public enum VariableKind { Number, Text, Date }

/// <summary>Row-wise access to one variable, for evaluating conditions.</summary>
public interface IVariable
{
    string Name { get; }
    VariableKind Kind { get; }
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
