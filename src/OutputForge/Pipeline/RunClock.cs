using System.Diagnostics;

namespace OutputForge.Pipeline;

/// <summary>
/// The timing of a run for its log: the whole run since it started, and one step at a time (reading the data, digesting
/// the inputs, building the tables), each in the milliseconds the --verbose lines print.
/// </summary>
internal sealed class RunClock
{
    private readonly Stopwatch _whole = Stopwatch.StartNew();
    private readonly Stopwatch _step = new();

    public TimeSpan Elapsed => _whole.Elapsed;

    public double ElapsedMilliseconds => _whole.Elapsed.TotalMilliseconds;

    public void StartStep() => _step.Restart();

    public double StepMilliseconds => _step.Elapsed.TotalMilliseconds;
}
