namespace OutputForge.Stats.MissingData;

/// <summary>
/// A scalar estimate combined over m completed-data analyses by Rubin's rules (<see cref="RubinsRules"/>): the pooled
/// estimate, the within (U-bar), between (B) and total (T) variances, the relative increase in variance due to
/// nonresponse r, the proportion of the total variance due to missingness lambda, the fraction of missing information
/// gamma, the degrees of freedom of Rubin (1987) and, when the complete-data degrees of freedom are given, the
/// small-sample degrees of freedom of Barnard and Rubin (1999); the t interval and two-sided p-value for estimate = 0
/// use <see cref="DegreesOfFreedom"/>. A degrees of freedom that is infinite (no between-imputation variance and no
/// complete-data degrees of freedom) means the normal distribution. Or, when not estimable, the reason.
/// </summary>
public sealed record PooledEstimate(
    int Imputations,
    double Estimate,
    double WithinVariance,
    double BetweenVariance,
    double TotalVariance,
    double RelativeIncreaseInVariance,
    double Lambda,
    double FractionMissingInformation,
    double RubinDegreesOfFreedom,
    double? BarnardRubinDegreesOfFreedom,
    double Statistic,
    double PValue,
    double Lower,
    double Upper,
    string? NotEstimableReason = null)
{
    public bool IsEstimable => NotEstimableReason is null;

    public double StandardError => Math.Sqrt(TotalVariance);

    /// <summary>The degrees of freedom of the interval and p-value: Barnard-Rubin's where the complete-data df was given, else Rubin's.</summary>
    public double DegreesOfFreedom => BarnardRubinDegreesOfFreedom ?? RubinDegreesOfFreedom;

    /// <summary>What a reader must see beside the numbers, e.g. that the imputations did not differ.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    public static PooledEstimate NotEstimable(int imputations, string reason) =>
        new(imputations, 0, 0, 0, 0, 0, 0, 0, 0, null, 0, 0, 0, 0, reason);
}
