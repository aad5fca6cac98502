namespace OutputForge.Spec;

/// <summary>
/// A spec that cannot be used. Carries every problem found; the message is the first of them,
/// already naming the file, line, column and JSON path.
/// </summary>
public sealed class SpecException : Exception
{
    public SpecException(IReadOnlyList<SpecProblem> problems)
        : base(Describe(problems))
    {
        Problems = problems;
    }

    public SpecException(SpecProblem problem)
        : this([problem])
    {
    }

    public IReadOnlyList<SpecProblem> Problems { get; }

    private static string Describe(IReadOnlyList<SpecProblem> problems) =>
        problems.Count switch
        {
            0 => "the spec has problems",
            1 => problems[0].ToString(),
            _ => $"{problems[0]} (and {problems.Count - 1} more problem{(problems.Count == 2 ? "" : "s")})",
        };
}
