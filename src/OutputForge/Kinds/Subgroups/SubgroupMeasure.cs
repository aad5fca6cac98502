using OutputForge.Analysis;
using OutputForge.Kinds.Responders;
using OutputForge.Results;
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

    /// <summary>The footnote describing the measure, and when a subgroup's effect is NE.</summary>
    public ResultNote Note(string id, string controlLabel, int minimumPerArm) =>
        ResultNote.Footnote(id, NoteKind.SubgroupEffect, ("measure", Code), ("method", Method), ("control", controlLabel), ("level", Level),
            ("minimum", minimumPerArm));

    /// <summary>The measure as notes name it: "difference", "odds-ratio" or "relative-risk".</summary>
    public string Code => Name switch
    {
        EffectMeasure.OddsRatio => "odds-ratio",
        EffectMeasure.RelativeRisk => "relative-risk",
        _ => "difference",
    };
}
