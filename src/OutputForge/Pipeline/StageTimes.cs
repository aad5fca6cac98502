using System.Diagnostics;

namespace OutputForge.Pipeline;

/// <summary>Milliseconds of the stages of one table (analysis, layout, each renderer), for the --verbose log.</summary>
internal sealed class StageTimes
{
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly List<string> _laps = [];

    public void Lap(string stage)
    {
        _laps.Add($"{stage} {_clock.Elapsed.TotalMilliseconds:0}");
        _clock.Restart();
    }

    public override string ToString() => string.Join(", ", _laps) + " ms";
}
