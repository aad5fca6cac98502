using OutputForge.Choices;

namespace OutputForge.Kinds.Responders;

/// <summary>How footnotes name each odds ratio interval, unstratified and stratified.</summary>
public static class OddsRatioIntervalMethods
{
    public static string Describe(OddsRatioIntervalMethod method, bool stratified) => (method, stratified) switch
    {
        (OddsRatioIntervalMethod.Woolf, false) => "Woolf (logit)",
        (OddsRatioIntervalMethod.Woolf, true) => "Robins-Breslow-Greenland",
        (OddsRatioIntervalMethod.Exact, false) => "exact conditional (Cornfield)",
        _ => throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown odds ratio interval."),
    };
}
