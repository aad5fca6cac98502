using OutputForge.Analysis;
using OutputForge.Choices;
namespace OutputForge.Kinds.TimeToEvent;

/// <summary>
/// Settings of the "time-to-event" kind: per arm events and censored subjects, the Kaplan-Meier median
/// with its Brookmeyer-Crowley interval and estimates at chosen times; per active arm against the
/// control a log-rank test and a Cox hazard ratio.
/// </summary>
public sealed class TimeToEventSettings
{
    public string Time { get; init; } = "AVAL";

    /// <summary>Censoring variable: 1 = censored, 0 = event (ADaM ADTTE).</summary>
    public string Censor { get; init; } = "CNSR";

    /// <summary>Unit of the time variable, as printed ("days").</summary>
    public string Unit { get; init; } = "days";

    /// <summary>Times (in the time variable's unit) for Kaplan-Meier estimates.</summary>
    public List<double> Times { get; init; } = [];

    /// <summary>Label of each estimate time, e.g. "Day 28"; "Day {time}" when absent.</summary>
    public List<string>? TimeLabels { get; init; }

    /// <summary>Event-free prints S(t); event prints 1 - S(t), the probability of the event by t.</summary>
    public SurvivalEstimate Estimate { get; init; } = MethodCatalog.SurvivalEstimate.DefaultValue;

    /// <summary>Stratification variables (endpoint record, else ADSL) of the log-rank test and Cox model.</summary>
    public List<string> Strata { get; init; } = [];

    /// <summary>Efron (default) or Breslow.</summary>
    public CoxTies Ties { get; init; } = MethodCatalog.CoxTies.DefaultValue;

    /// <summary>Decimals of the median and its interval.</summary>
    public int Decimals { get; init; } = 1;

    public int HazardRatioDecimals { get; init; } = 2;
}
