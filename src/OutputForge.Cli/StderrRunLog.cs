using OutputForge.Pipeline;

namespace OutputForge.Cli;

/// <summary>
/// The run log as plain lines on stderr (stdout stays free for machine-readable output): used when
/// stderr is redirected, under CI, and in tests. Safe to call from the threads that build tables.
/// </summary>
public sealed class StderrRunLog(TextWriter error, Verbosity verbosity) : IRunLog
{
    private readonly object _gate = new();

    public void Info(string message)
    {
        if (verbosity != Verbosity.Quiet)
        {
            Write(message);
        }
    }

    public void Warning(string message) => Write("warning: " + message);

    public void Detail(string message)
    {
        if (verbosity == Verbosity.Verbose)
        {
            Write(message);
        }
    }

    private void Write(string line)
    {
        lock (_gate)
        {
            error.WriteLine(line);
        }
    }
}
