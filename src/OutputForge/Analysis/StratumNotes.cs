using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Analysis;

/// <summary>
/// Stats' remarks on the strata a stratified method left out (<see cref="StratumRemark"/>: an index and a reason) as
/// warnings that name the stratum as the reader knows it, by its values: the caller, which built the strata, names
/// them; Layout words the note (<see cref="NoteKind.StratumLeftOut"/>).
/// </summary>
public static class StratumNotes
{
    /// <param name="about">What the stratified method was about (the comparison, the block); the stratum is added.</param>
    /// <param name="stratum">The values of the stratum at the remark's index.</param>
    /// <param name="group">The name of a group by its number in the method's input (1 or 2), e.g. the arm's label.</param>
    /// <param name="term">What the strata are called when they are not strata (e.g. "Level" for a subgroup variable's levels).</param>
    public static ResultNote LeftOut(StratumRemark remark, NoteSubject about, IReadOnlyList<string> stratum, Func<int, string> group, string? term = null)
    {
        ArgumentNullException.ThrowIfNull(remark);
        ArgumentNullException.ThrowIfNull(about);
        ArgumentNullException.ThrowIfNull(group);
        var values = new List<(string, object)> { ("reason", StratumReasons.Code(remark.Reason)) };
        if (remark.Group is { } number)
            values.Add(("group", group(number)));
        if (remark.Method is { } method)
            values.Add(("method", method));
        if (term is not null)
            values.Add(("term", term));
        return ResultNote.Warning(NoteKind.StratumLeftOut, about with { Stratum = stratum }, [.. values]);
    }
}
