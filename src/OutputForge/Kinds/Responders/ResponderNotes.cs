namespace OutputForge.Kinds.Responders;

/// <summary>The ids by which a responder table's rows refer to its footnotes (Layout letters them in order of first reference).</summary>
internal static class ResponderNotes
{
    public const string Proportion = "proportion-interval";
    public const string Difference = "difference-interval";
    public const string Test = "unstratified-test";
    public const string StratifiedDifference = "stratified-difference";
    public const string Cmh = "cmh-test";
    public const string Homogeneity = "homogeneity-test";
    public const string RelativeRisk = "relative-risk";
    public const string OddsRatio = "odds-ratio";
}
