using OutputForge.Pipeline;
using Spectre.Console;

namespace OutputForge.Cli;

/// <summary>
/// The run log on a terminal: the same lines as <see cref="StderrRunLog"/>, warnings in colour,
/// and a progress line ("[12/60] table 14.2.1.3") that is redrawn in place while tables are built.
/// </summary>
public sealed class TerminalRunLog : IRunLog
{
    private readonly IAnsiConsole _console;
    private readonly Verbosity _verbosity;
    private readonly object _gate = new();
    private bool _progressShown;

    public TerminalRunLog(Verbosity verbosity)
    {
        _verbosity = verbosity;
        _console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(Console.Error),
            Ansi = AnsiSupport.Detect,
            ColorSystem = ColorSystemSupport.Detect,
        });
    }

    /// <summary>A terminal that can take a redrawn line: stderr not redirected, not under CI, not a dumb terminal.</summary>
    public static bool Available =>
        !Console.IsErrorRedirected
        && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("CI"))
        && Environment.GetEnvironmentVariable("TERM") is not "dumb";

    public void Info(string message)
    {
        if (_verbosity != Verbosity.Quiet)
        {
            Line(Markup.Escape(message));
        }
    }

    public void Warning(string message) => Line("[yellow]warning:[/] " + Markup.Escape(message));

    public void Detail(string message)
    {
        if (_verbosity == Verbosity.Verbose)
        {
            Line("[grey]" + Markup.Escape(message) + "[/]");
        }
    }

    public void Progress(int done, int total, string item)
    {
        if (_verbosity == Verbosity.Quiet || total < 2)
        {
            return;
        }
        lock (_gate)
        {
            ClearProgress();
            if (done < total)
            {
                _console.Markup($"[blue][[{done}/{total}]][/] table {Markup.Escape(item)}");
                _progressShown = true;
            }
        }
    }

    private void Line(string markup)
    {
        lock (_gate)
        {
            ClearProgress();
            _console.MarkupLine(markup);
        }
    }

    private void ClearProgress()
    {
        if (_progressShown)
        {
            // Carriage return and "erase line" (ECMA-48 EL 2), so the progress line is redrawn in place.
            Console.Error.Write("\r\u001b[2K");
            _progressShown = false;
        }
    }
}
