namespace OutputForge.Stats.Stratified;

/// <summary>
/// One stratum of a 2 x 2 x K analysis: events out of subjects in group 1 and in group 2, i.e. the
/// table [[Events1, Total1 - Events1], [Events2, Total2 - Events2]].
/// </summary>
public sealed record StratumCounts(int Events1, int Total1, int Events2, int Total2)
{
    internal int A => Events1;
    internal int B => Total1 - Events1;
    internal int C => Events2;
    internal int D => Total2 - Events2;
    internal int N => Total1 + Total2;
    internal int EventTotal => Events1 + Events2;
}
