namespace OutputForge.Choices;

/// <summary>The common risk difference of a stratified responder analysis.</summary>
public enum StratifiedDifference
{
    MantelHaenszel,
    MiettinenNurminen,
}
