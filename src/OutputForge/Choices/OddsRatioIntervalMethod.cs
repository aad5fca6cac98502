namespace OutputForge.Choices;

/// <summary>
/// The interval of the odds ratio rows, as the spec's "oddsRatioInterval" names it. Each method states
/// what it is unstratified and stratified, so that a further method (e.g. an exact conditional
/// interval) is one more member here and one more case where the interval is computed.
/// </summary>
public enum OddsRatioIntervalMethod
{
    /// <summary>Large-sample log interval: Woolf (1955) unstratified, Robins-Breslow-Greenland (1986) around the Mantel-Haenszel odds ratio when stratified.</summary>
    Woolf,

    /// <summary>Conditional maximum-likelihood odds ratio with the exact (Cornfield 1956) interval; unstratified tables only.</summary>
    Exact,
}
