namespace OutputForge.Stats.Proportions;

/// <summary>Confidence interval methods for the difference of two independent proportions (group 1 minus group 2).</summary>
public enum DifferenceCiMethod
{
    Wald,
    WaldCorrected,
    Newcombe,
    AgrestiCaffo,
    MiettinenNurminen,
}
