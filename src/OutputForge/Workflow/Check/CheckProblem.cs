using OutputForge.Data;
using OutputForge.Spec;

namespace OutputForge.Workflow.Check;

public enum CheckSeverity { Error, Warning }

/// <summary>
/// One problem `check` found: how bad, where (file, and line or line:column with the JSON path),
/// what, and how to fix it.
/// </summary>
public sealed record CheckProblem(CheckSeverity Severity, string File, string Where, string Message, string Hint)
{
    public static CheckProblem FromSpec(SpecProblem problem, CheckSeverity severity = CheckSeverity.Error)
    {
        var where = problem.Line is { } line ? (problem.Column is { } column ? $"{line}:{column}" : $"{line}") : string.Empty;
        where = where.Length == 0 ? problem.JsonPath : $"{where} {problem.JsonPath}";
        return new CheckProblem(problem.IsWarning ? CheckSeverity.Warning : severity, problem.File, where, problem.Message, CheckHints.ForSpec(problem));
    }

    public static CheckProblem FromData(DataException problem, string hint, CheckSeverity severity = CheckSeverity.Error)
    {
        var where = problem.Line is { } line ? $"line {line}" : string.Empty;
        if (problem.Variable is not null)
        {
            where += (where.Length == 0 ? "" : ", ") + $"variable {problem.Variable}";
        }
        return new CheckProblem(severity, problem.File, where, problem.Problem, hint);
    }

    public override string ToString() =>
        $"{(Severity == CheckSeverity.Error ? "error" : "warning")}: {File}{(Where.Length == 0 ? "" : " " + Where)}: {Message}";
}
