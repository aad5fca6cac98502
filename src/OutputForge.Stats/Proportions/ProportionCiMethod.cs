namespace OutputForge.Stats.Proportions;

/// <summary>Confidence interval methods for a single binomial proportion.</summary>
public enum ProportionCiMethod
{
    Wald,
    Wilson,
    WilsonCorrected,
    ClopperPearson,
    AgrestiCoull,
    Jeffreys,
}
