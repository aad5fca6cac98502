namespace OutputForge.Pipeline;

/// <summary>Where a run reports what it does: tables written, warnings, timing.</summary>
public interface IRunLog
{
    void Info(string message);
    void Warning(string message);

    /// <summary>Details for --verbose: stage timings, per-table facts.</summary>
    void Detail(string message)
    {
    }

    /// <summary><paramref name="done"/> of <paramref name="total"/> items finished, the last being <paramref name="item"/>.</summary>
    void Progress(int done, int total, string item)
    {
    }
}

/// <summary>A log that keeps every line, for tests and for callers that print later.</summary>
public sealed class CollectingRunLog : IRunLog
{
    private readonly List<string> _lines = [];

    public IReadOnlyList<string> Lines => _lines;

    public void Info(string message) => _lines.Add(message);

    public void Warning(string message) => _lines.Add("warning: " + message);

    public void Detail(string message) => _lines.Add("detail: " + message);
}
