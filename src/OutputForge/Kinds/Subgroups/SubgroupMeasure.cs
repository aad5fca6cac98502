using OutputForge.Analysis;
using OutputForge.Kinds.Responders;
using OutputForge.Stats;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// The treatment effect of one active arm against the control within a set of subjects: the
/// difference in proportions (each arm minus the control, in percentage points, with the interval
/// method of the statistics spec), the odds ratio with the Woolf interval, or the relative risk with
/// the Katz log interval; what "no effect" is on its scale, and how footnotes and the plot name it.
/// </summary>
internal sealed record SubgroupMeasure(EffectMeasure Name, string Label, string Method, double Scale, double NoEffect, bool IsRatio, int Decimals,
    DifferenceCiMethod DifferenceMethod, double Level)
{
    public static SubgroupMeasure From(EffectMeasure name, DifferenceCiMethod differenceMethod, double level, int percentDecimals, int ratioDecimals)
    {
        return name switch
        {
            EffectMeasure.OddsRatio => new(name, "Odds ratio", "Woolf logit interval", 1, 1, true, ratioDecimals, differenceMethod, level),
            EffectMeasure.RelativeRisk => new(name, "Relative risk", "Katz log interval", 1, 1, true, ratioDecimals, differenceMethod, level),
            EffectMeasure.Difference => new(name, "Difference, %", MethodCatalog.Describe(differenceMethod), 100, 0, false, percentDecimals, differenceMethod, level),
            _ => throw new ArgumentOutOfRangeException(nameof(name), name, "unknown subgroup measure"),
        };
    }

    public IntervalResult Compute(ResponderCounts active, ResponderCounts control) => Name switch
    {
        EffectMeasure.OddsRatio => OddsRatio.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, Level),
        EffectMeasure.RelativeRisk => RelativeRisk.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, Level),
        _ => ProportionDifferenceInterval.Compute(active.Responders, active.Denominator, control.Responders, control.Denominator, DifferenceMethod, Level),
    };

    /// <summary>The footnote describing the measure.</summary>
    public string Note(string controlLabel, string levelText) => Name switch
    {
        EffectMeasure.OddsRatio => $"Odds ratio of response (arm vs {controlLabel}) with the Woolf (logit) {levelText} confidence interval; not estimable when a cell of the 2 x 2 table is zero.",
        EffectMeasure.RelativeRisk => $"Relative risk of response (arm vs {controlLabel}) with the Katz (log) {levelText} confidence interval; not estimable when an arm has no responders.",
        _ => $"Difference in proportions of responders (arm minus {controlLabel}), in percentage points, with the {Method} {levelText} confidence interval.",
    };
}
