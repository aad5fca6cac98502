using OutputForge.Analysis;
using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// One active arm against the control, stratified: the 2 x 2 table of each stratum, the common risk
/// difference (Mantel-Haenszel with Sato's variance, or the stratified Miettinen-Nurminen score
/// interval), the Cochran-Mantel-Haenszel test, optionally the Breslow-Day test, and the
/// Mantel-Haenszel relative risk and odds ratio. Strata without subjects of one of the two arms carry
/// no information on the comparison: they are left out, and named in <see cref="Notes"/>.
/// </summary>
public sealed record StratifiedComparison(
    TreatmentArm Arm,
    IntervalResult Difference,
    TestResult Test,
    TestResult? Homogeneity,
    IntervalResult? RelativeRisk,
    IntervalResult? OddsRatio,
    int StrataUsed,
    IReadOnlyList<ResultNote> Notes)
{
    public static StratifiedComparison Compute(TreatmentArm arm, TreatmentArm control, IReadOnlyList<ResponderSubject> subjects,
        ResponderStrata strata, ResponderStratification spec, double level, bool withRelativeRisk, OddsRatioIntervalMethod? oddsRatioMethod)
    {
        var notes = new List<ResultNote>();
        var used = new List<StratumCounts>();
        var usedNames = new List<string>();
        // One pass sorts the two arms' subjects into their strata, rather than one scan of all subjects per stratum.
        var ofStratum = new Dictionary<string, (List<ResponderSubject> Active, List<ResponderSubject> Reference)>(StringComparer.Ordinal);
        foreach (var stratum in strata.Levels)
        {
            ofStratum.TryAdd(stratum, ([], []));
        }
        foreach (var subject in subjects)
        {
            if (!subject.InDenominator || !strata.StratumOfSubject.TryGetValue(subject.Subject, out var value)
                || !ofStratum.TryGetValue(value, out var lists))
            {
                continue;
            }
            if (subject.Arm == arm)
            {
                lists.Active.Add(subject);
            }
            if (subject.Arm == control)
            {
                lists.Reference.Add(subject);
            }
        }
        foreach (var stratum in strata.Levels)
        {
            var (active, reference) = ofStratum[stratum];
            if (active.Count == 0 || reference.Count == 0)
            {
                var count = active.Count + reference.Count;
                var subject = new NoteSubject(Arm: arm.Label, Control: control.Label, Stratum: [stratum]);
                notes.Add(count == 0
                    ? ResultNote.Warning(NoteKind.DroppedStratum, subject, ("subjects", 0))
                    : ResultNote.Warning(NoteKind.DroppedStratum, subject, ("subjects", count), ("withoutArm", active.Count == 0 ? arm.Label : control.Label)));
                continue;
            }
            used.Add(new StratumCounts(active.Count(s => s.Responded), active.Count, reference.Count(s => s.Responded), reference.Count));
            usedNames.Add(stratum);
        }
        var difference = spec.Difference == StratifiedDifference.MiettinenNurminen
            ? StratifiedMiettinenNurminen.Compute(used, level)
            : MantelHaenszelRiskDifference.Compute(used, level);
        var test = CochranMantelHaenszelTest.Compute(used, spec.Test == StratifiedTest.CmhCorrected);
        var homogeneity = spec.Homogeneity ? BreslowDayTest.Compute(used) : null;
        var relativeRisk = withRelativeRisk ? MantelHaenszelRelativeRisk.Compute(used, level) : null;
        var oddsRatio = oddsRatioMethod switch
        {
            null => null,
            OddsRatioIntervalMethod.Woolf => MantelHaenszelOddsRatio.Compute(used, level),
            _ => throw new ArgumentOutOfRangeException(nameof(oddsRatioMethod), oddsRatioMethod, "Unknown odds ratio interval."),
        };
        // The methods run on the same strata, so a stratum one leaves out the others leave out too: say it once. Stats
        // returns the strata by their index in the list it was given; usedNames names them.
        var about = new NoteSubject(Arm: arm.Label, Control: control.Label);
        var remarks = new HashSet<StratumRemark>();
        var texts = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (strataRemarks, methodNotes) in new[] { (difference.StratumRemarks, difference.Notes), (test.StratumRemarks, test.Notes),
            (homogeneity?.StratumRemarks ?? [], homogeneity?.Notes ?? []), (relativeRisk?.StratumRemarks ?? [], relativeRisk?.Notes ?? []),
            (oddsRatio?.StratumRemarks ?? [], oddsRatio?.Notes ?? []) })
        {
            foreach (var remark in strataRemarks.Where(remarks.Add))
            {
                notes.Add(StratumNotes.LeftOut(remark, about, [usedNames[remark.Stratum]], g => g == 1 ? arm.Label : control.Label));
            }
            foreach (var text in methodNotes.Where(texts.Add))
            {
                notes.Add(ResultNote.Warning(NoteKind.MethodRemark, about, ("text", text)));
            }
        }
        return new StratifiedComparison(arm, difference, test, homogeneity, relativeRisk, oddsRatio, used.Count, notes);
    }
}
