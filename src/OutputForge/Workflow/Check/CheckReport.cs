namespace OutputForge.Workflow.Check;

/// <summary>
/// Everything `check` found: errors first, then warnings, each in the order found. A problem
/// repeated on many rows (same file and kind, e.g. one flag variable miscoded throughout) is listed
/// <see cref="RepeatsShown"/> times and then only counted, so it does not bury the rest.
/// </summary>
public sealed class CheckReport
{
    public const int RepeatsShown = 5;

    private readonly List<(CheckProblem Problem, string? Kind)> _entries = [];
    private readonly List<(CheckProblem First, string Kind, int Count)> _repeats = [];
    private readonly HashSet<string> _seen = new(StringComparer.Ordinal);

    public IReadOnlyList<CheckProblem> Problems => _entries.Select(e => e.Problem).OrderBy(p => p.Severity).ToList();

    public int Errors => Count(CheckSeverity.Error);
    public int Warnings => Count(CheckSeverity.Warning);

    private int Count(CheckSeverity severity) =>
        _entries.Count(e => e.Problem.Severity == severity) + _repeats.Where(r => r.First.Severity == severity).Sum(r => r.Count);

    /// <param name="kind">A name for problems of one kind (e.g. "flag values of ITTFL"); beyond <see cref="RepeatsShown"/> per file they are counted only.</param>
    public void Add(CheckProblem problem, string? kind = null)
    {
        if (!_seen.Add(problem.ToString()))
        {
            return;
        }
        if (kind is not null && _entries.Count(e => e.Kind == kind && e.Problem.File == problem.File) >= RepeatsShown)
        {
            var index = _repeats.FindIndex(r => r.Kind == kind && r.First.File == problem.File);
            if (index < 0)
            {
                _repeats.Add((problem, kind, 1));
            }
            else
            {
                _repeats[index] = _repeats[index] with { Count = _repeats[index].Count + 1 };
            }
            return;
        }
        _entries.Add((problem, kind));
    }

    public void Write(TextWriter output)
    {
        foreach (var problem in Problems)
        {
            output.WriteLine(problem);
            output.WriteLine($"  hint: {problem.Hint}");
        }
        foreach (var (first, kind, count) in _repeats.OrderBy(r => r.First.Severity))
        {
            output.WriteLine($"{(first.Severity == CheckSeverity.Error ? "error" : "warning")}: {first.File}: {count} more problem{(count == 1 ? "" : "s")} of the same kind ({kind}), first at {first.Where}");
        }
        output.WriteLine($"check: {Errors} error{(Errors == 1 ? "" : "s")}, {Warnings} warning{(Warnings == 1 ? "" : "s")}");
    }
}
