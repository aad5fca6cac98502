using OutputForge.Analysis;
using OutputForge.Stats;

namespace OutputForge.Kinds.TimeToEvent;

/// <summary>
/// One active arm against the control, on the subjects of those two arms only: the log-rank test
/// (stratified when the spec names strata) and the Cox model hazard ratio (active vs control) with its
/// Wald interval. An arm without events makes the partial likelihood monotone: no hazard ratio is
/// printed and the reason is given instead.
/// </summary>
/// <param name="Strata">The values of each stratum index of the log-rank test's remarks ("F / &lt;65"); empty when unstratified.</param>
internal sealed record TimeToEventComparison(TreatmentArm Arm, TestResult LogRank, IntervalResult HazardRatio, int Iterations, IReadOnlyList<string> Strata)
{
    public static TimeToEventComparison Compute(TreatmentArm arm, TreatmentArm control, IReadOnlyList<TimeToEventSubject> subjects,
        bool stratified, CoxTies ties, double level)
    {
        var pair = subjects.Where(s => s.Arm == arm || s.Arm == control).ToList();
        var data = new SurvivalData(pair.Select(s => s.Time).ToList(), pair.Select(s => s.Event).ToList());
        var group = pair.Select(s => s.Arm == arm ? 1 : 0).ToList();
        IReadOnlyList<int>? strata = null;
        List<string> levels = [];
        if (stratified)
        {
            // The remarks name a stratum by its values ("F / <65"), as the reader of the table knows it.
            levels = pair.Select(s => s.Stratum!).Distinct().Order(StringComparer.Ordinal).ToList();
            strata = pair.Select(s => levels.IndexOf(s.Stratum!)).ToList();
        }
        var logRank = LogRankTest.Compute(data, group, strata);
        var withoutEvents = new[] { arm, control }.Where(a => !pair.Any(s => s.Arm == a && s.Event)).ToList();
        if (withoutEvents.Count > 0)
        {
            var reason = $"no events in {string.Join(" and ", withoutEvents.Select(a => a.Label))}; the Cox partial likelihood is monotone and has no finite maximum";
            return new TimeToEventComparison(arm, logRank, IntervalResult.NotEstimable(reason), 0, levels);
        }
        var x = new double[pair.Count, 1];
        for (var i = 0; i < pair.Count; i++)
        {
            x[i, 0] = group[i];
        }
        var fit = CoxProportionalHazards.Fit(data, x, ties, strata);
        return new TimeToEventComparison(arm, logRank, fit.HazardRatio(0, level), fit.Iterations, levels);
    }
}
