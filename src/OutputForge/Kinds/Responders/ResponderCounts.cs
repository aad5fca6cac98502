using OutputForge.Spec;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// Counts of one column of a responder table: subjects of the population (N), subjects with an
/// endpoint record (evaluated), responders, and the denominator that the missing-data rule gives.
/// </summary>
public sealed record ResponderCounts(int Population, int Evaluated, int Responders, bool MissingAreNonResponders)
{
    public int Missing => Population - Evaluated;

    /// <summary>The denominator of percentages and intervals.</summary>
    public int Denominator => MissingAreNonResponders ? Population : Evaluated;

    public int NonResponders => Denominator - Responders;

    public static ResponderCounts operator +(ResponderCounts a, ResponderCounts b) =>
        new(a.Population + b.Population, a.Evaluated + b.Evaluated, a.Responders + b.Responders, a.MissingAreNonResponders);
}
