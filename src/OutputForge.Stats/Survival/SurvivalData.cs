namespace OutputForge.Stats.Survival;

/// <summary>
/// Right-censored survival observations: a time (at least 0) and whether the event was observed
/// at that time (false = censored, i.e. ADaM CNSR = 1). Checks its input once for every method.
/// </summary>
public sealed class SurvivalData
{
    public SurvivalData(IReadOnlyList<double> times, IReadOnlyList<bool> events)
    {
        if (times.Count != events.Count)
        {
            throw new ArgumentException($"{times.Count} times for {events.Count} event indicators", nameof(events));
        }
        if (times.Any(t => !double.IsFinite(t) || t < 0))
        {
            throw new ArgumentException("survival times must be finite and not negative", nameof(times));
        }
        Times = times;
        Events = events;
    }

    public IReadOnlyList<double> Times { get; }
    public IReadOnlyList<bool> Events { get; }
    public int Count => Times.Count;
    public int EventCount => Events.Count(e => e);

    public SurvivalData Subset(IEnumerable<int> rows)
    {
        var list = rows.ToList();
        return new SurvivalData(list.Select(i => Times[i]).ToList(), list.Select(i => Events[i]).ToList());
    }
}
