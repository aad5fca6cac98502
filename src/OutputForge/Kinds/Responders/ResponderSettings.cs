namespace OutputForge.Kinds.Responders;

/// <summary>
/// Optional settings of the "responders" kind (docs/kinds-responders.md): an analysis stratified by
/// ADSL variables, and relative risk / odds ratio rows of each active arm against the control.
/// </summary>
public sealed class ResponderSettings
{
    /// <summary>The stratified analysis; none when absent.</summary>
    public ResponderStratification? Stratified { get; init; }

    /// <summary>Ratio rows: "relative-risk", "odds-ratio".</summary>
    public List<string> Ratios { get; init; } = [];

    /// <summary>
    /// Interval of the odds ratio: "woolf" is the large-sample log interval (Woolf unstratified; the
    /// Robins-Breslow-Greenland interval of the Mantel-Haenszel odds ratio when stratified).
    /// </summary>
    public string OddsRatioInterval { get; init; } = "woolf";

    /// <summary>Decimals of the ratios and their intervals.</summary>
    public int RatioDecimals { get; init; } = 2;
}

/// <summary>Strata (cross-classified ADSL variables) and the stratified methods of a responder table.</summary>
public sealed class ResponderStratification
{
    /// <summary>ADSL variables whose combined values define the strata, e.g. the randomization factors.</summary>
    public List<string> Strata { get; init; } = [];

    /// <summary>"mantel-haenszel" (Sato variance) or "miettinen-nurminen" (stratified score interval).</summary>
    public string Difference { get; init; } = "mantel-haenszel";

    /// <summary>"cmh" or "cmh-corrected" (with continuity correction).</summary>
    public string Test { get; init; } = "cmh";

    /// <summary>Adds the Breslow-Day test (Tarone's correction) of equal odds ratios across strata.</summary>
    public bool Homogeneity { get; init; }
}
