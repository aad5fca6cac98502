namespace OutputForge.Data;

/// <summary>
/// Data that cannot be used as it is. The message already names the file, and where known the
/// line and the variable, so the command line prints it as it is; the parts stay apart as data
/// (<see cref="Code"/>, <see cref="Problem"/>), for `check`'s hints and grouping.
/// </summary>
public sealed class DataException : Exception
{
    public DataException(string file, int? line, string? variable, string problem, DataProblemCode code = DataProblemCode.File)
        : base(Compose(file, line, variable, problem))
    {
        File = file;
        Line = line;
        Variable = variable;
        Problem = problem;
        Code = code;
    }

    public string File { get; }
    public int? Line { get; }
    public string? Variable { get; }

    /// <summary>What is wrong, without the file, line and variable.</summary>
    public string Problem { get; }

    public DataProblemCode Code { get; }

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
