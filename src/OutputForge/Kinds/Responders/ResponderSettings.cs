using OutputForge.Analysis;
using OutputForge.Choices;
namespace OutputForge.Kinds.Responders;

/// <summary>
/// Optional settings of the "responders" kind (docs/kinds-responders.md): an analysis stratified by
/// ADSL variables, and relative risk / odds ratio rows of each active arm against the control.
/// </summary>
public sealed class ResponderSettings
{
    /// <summary>The stratified analysis; none when absent.</summary>
    public ResponderStratification? Stratified { get; init; }

    /// <summary>Ratio rows: relative risk, odds ratio.</summary>
    public List<RatioMeasure> Ratios { get; init; } = [];

    /// <summary>
    /// Interval of the odds ratio: Woolf is the large-sample log interval (Woolf unstratified; the
    /// Robins-Breslow-Greenland interval of the Mantel-Haenszel odds ratio when stratified).
    /// </summary>
    public OddsRatioIntervalMethod OddsRatioInterval { get; init; } = MethodCatalog.OddsRatioInterval.DefaultValue;

    /// <summary>Decimals of the ratios and their intervals.</summary>
    public int RatioDecimals { get; init; } = 2;
}

/// <summary>Strata (cross-classified ADSL variables) and the stratified methods of a responder table.</summary>
public sealed class ResponderStratification
{
    /// <summary>ADSL variables whose combined values define the strata, e.g. the randomization factors.</summary>
    public List<string> Strata { get; init; } = [];

    /// <summary>Mantel-Haenszel (Sato variance) or Miettinen-Nurminen (stratified score interval).</summary>
    public StratifiedDifference Difference { get; init; } = MethodCatalog.StratifiedDifference.DefaultValue;

    /// <summary>CMH, without or with continuity correction.</summary>
    public StratifiedTest Test { get; init; } = MethodCatalog.StratifiedTest.DefaultValue;

    /// <summary>Adds the Breslow-Day test (Tarone's correction) of equal odds ratios across strata.</summary>
    public bool Homogeneity { get; init; }
}
