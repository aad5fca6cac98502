using OutputForge.Analysis;
using OutputForge.Stats;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// Relative risk and odds ratio of one active arm to the control (either may be absent when the spec does
/// not ask for it): unstratified, the relative risk with the Katz log interval and the odds ratio with the
/// interval the spec chose; stratified, the Mantel-Haenszel estimates of <see cref="StratifiedComparison"/>.
/// No correction is added to zero cells: a ratio with a zero cell is not estimable, and says why.
/// </summary>
public sealed record ResponderRatios(TreatmentArm Arm, IntervalResult? RelativeRisk, IntervalResult? OddsRatio)
{
    public static ResponderRatios Unstratified(TreatmentArm arm, ResponderCounts active, ResponderCounts control,
        bool withRelativeRisk, bool withOddsRatio, OddsRatioIntervalMethod oddsRatioMethod, double level) =>
        new(arm,
            withRelativeRisk ? Stats.Proportions.RelativeRisk.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, level) : null,
            withOddsRatio ? UnstratifiedOddsRatio(active, control, oddsRatioMethod, level) : null);

    /// <summary>
    /// An infinite conditional estimate (and upper limit), when every subject of the active arm responded or none of the
    /// control did, has no number to print: the cell is NE with the reason, and the interval's own notes are kept.
    /// </summary>
    private static IntervalResult Displayable(IntervalResult exact) =>
        exact.IsEstimable && (double.IsInfinity(exact.Estimate) || double.IsInfinity(exact.Upper))
            ? IntervalResult.NotEstimable("the conditional maximum-likelihood odds ratio is infinite" +
                (exact.Notes.Count > 0 ? " (" + string.Join("; ", exact.Notes) + ")" : string.Empty)) with { Notes = exact.Notes }
            : exact;

    public static ResponderRatios Stratified(StratifiedComparison comparison) => new(comparison.Arm, comparison.RelativeRisk, comparison.OddsRatio);

    private static IntervalResult UnstratifiedOddsRatio(ResponderCounts active, ResponderCounts control, OddsRatioIntervalMethod method, double level) => method switch
    {
        OddsRatioIntervalMethod.Woolf => Stats.Proportions.OddsRatio.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, level),
        OddsRatioIntervalMethod.Exact => Displayable(ExactConditionalOddsRatio.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, level)),
        _ => throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown odds ratio interval."),
    };
}
