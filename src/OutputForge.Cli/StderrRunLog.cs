using OutputForge.Pipeline;

namespace OutputForge.Cli;

/// <summary>The run log on stderr, so stdout stays free for machine-readable output.</summary>
public sealed class StderrRunLog(TextWriter error, bool quiet) : IRunLog
{
    public void Info(string message)
    {
        if (!quiet)
        {
            error.WriteLine(message);
        }
    }

    public void Warning(string message) => error.WriteLine("warning: " + message);
}
