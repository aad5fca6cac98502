namespace OutputForge.Pipeline;

/// <summary>Where a run reports what it does: tables written, warnings, timing.</summary>
public interface IRunLog
{
    void Info(string message);
    void Warning(string message);
}

/// <summary>A log that keeps every line, for tests and for callers that print later.</summary>
public sealed class CollectingRunLog : IRunLog
{
    private readonly List<string> _lines = [];

    public IReadOnlyList<string> Lines => _lines;

    public void Info(string message) => _lines.Add(message);

    public void Warning(string message) => _lines.Add("warning: " + message);
}
