namespace OutputForge.Results;

/// <summary>Which tail or tails a p-value or a confidence interval covers; written to results.json as "two-sided", "lower" or "upper".</summary>
public enum Sidedness
{
    /// <summary>Both tails: a two-sided p-value, or an interval with a lower and an upper bound.</summary>
    TwoSided,
    /// <summary>A one-sided test or bound in the lower tail.</summary>
    Lower,
    /// <summary>A one-sided test or bound in the upper tail.</summary>
    Upper,
}
