namespace OutputForge.Stats.Models;

/// <summary>
/// A term of the fixed-effects part of a mixed model for repeated measures: a class covariate, an
/// interaction of class covariates, a numeric covariate, or a numeric covariate by class covariates
/// (a slope per level). Terms are coded against the first level of each class covariate, so a model
/// must hold the main effect of every class and numeric covariate that appears in an interaction.
/// </summary>
public sealed record MmrmTerm(IReadOnlyList<string> Factors, string? Covariate = null)
{
    public static MmrmTerm Factor(string name) => new([name]);
    public static MmrmTerm Numeric(string name) => new([], name);
    public static MmrmTerm Interaction(params string[] factors) => new(factors);
    public static MmrmTerm Slope(string covariate, params string[] factors) => new(factors, covariate);

    /// <summary>Factor names then the covariate, joined by ':' (as the column names read).</summary>
    public string Name => string.Join(":", Covariate is null ? Factors : Factors.Append(Covariate));
}
