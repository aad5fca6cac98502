namespace OutputForge.Choices;

/// <summary>The test of each active arm against the control on a responder table (the spec's statistics.test, `calc table --test`).</summary>
public enum TableTest
{
    Auto,
    ChiSquare,
    Yates,
    LikelihoodRatio,
    Fisher,
}
