namespace OutputForge.Data;

/// <summary>
/// Data that cannot be used as it is. The message already names the file, and where known the
/// line and the variable, so the command line prints it as it is.
/// </summary>
public sealed class DataException : Exception
{
    public DataException(string file, int? line, string? variable, string problem)
        : base(Compose(file, line, variable, problem))
    {
        File = file;
        Line = line;
        Variable = variable;
    }

    public string File { get; }
    public int? Line { get; }
    public string? Variable { get; }

    private static string Compose(string file, int? line, string? variable, string problem)
    {
        var where = file;
        if (line is not null)
        {
            where += $" line {line}";
        }
        if (variable is not null)
        {
            where += $", variable {variable}";
        }
        return $"{where}: {problem}";
    }
}
