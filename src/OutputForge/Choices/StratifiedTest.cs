namespace OutputForge.Choices;

/// <summary>The Cochran-Mantel-Haenszel test of a stratified responder analysis.</summary>
public enum StratifiedTest
{
    Cmh,
    CmhCorrected,
}
