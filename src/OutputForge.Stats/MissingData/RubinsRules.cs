using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.MissingData;

/// <summary>
/// Rubin's rules for combining a scalar estimate over m &gt;= 2 completed-data analyses (Rubin 1987, Multiple
/// Imputation for Nonresponse in Surveys, section 3.1; notation of van Buuren 2018, Flexible Imputation of Missing
/// Data, 2nd ed., section 2.3):
/// Q-bar = mean of the estimates Q_l; U-bar = mean of their variances U_l; B = sum (Q_l - Q-bar)^2 / (m - 1);
/// T = U-bar + (1 + 1/m) B; r = (1 + 1/m) B / U-bar; lambda = (1 + 1/m) B / T;
/// Rubin's degrees of freedom nu_old = (m - 1) / lambda^2 = (m - 1)(1 + 1/r)^2.
/// With the complete-data degrees of freedom nu_com, Barnard and Rubin (1999, Biometrika 86:948-955, eq. 3):
/// nu_obs = (nu_com + 1) / (nu_com + 3) nu_com (1 - lambda) and nu = nu_old nu_obs / (nu_old + nu_obs).
/// The fraction of missing information gamma = (r + 2 / (nu + 3)) / (r + 1) (Rubin 1987, eq. 3.1.10, with the
/// degrees of freedom used). Interval Q-bar +/- t_{nu, 1 - alpha/2} sqrt(T); test of Q = 0 by t = Q-bar / sqrt(T).
/// </summary>
public static class RubinsRules
{
    /// <param name="estimates">The estimate of each completed-data analysis.</param>
    /// <param name="variances">The squared standard error of each, in the same order.</param>
    /// <param name="level">Two-sided confidence level.</param>
    /// <param name="completeDataDegreesOfFreedom">The degrees of freedom of the analysis had there been no missing data
    /// (n - p for a linear model); null for a large-sample analysis, which leaves Rubin's degrees of freedom.</param>
    public static PooledEstimate Pool(IReadOnlyList<double> estimates, IReadOnlyList<double> variances, double level,
        double? completeDataDegreesOfFreedom = null)
    {
        ArgumentNullException.ThrowIfNull(estimates);
        ArgumentNullException.ThrowIfNull(variances);
        ConfidenceLevel.Validate(level);
        var m = estimates.Count;
        if (variances.Count != m)
        {
            throw new ArgumentException($"{m} estimates but {variances.Count} variances; give one variance per estimate", nameof(variances));
        }
        if (m < 2)
        {
            throw new ArgumentException($"{m} completed-data analyses; Rubin's rules need at least 2", nameof(estimates));
        }
        for (var l = 0; l < m; l++)
        {
            if (!double.IsFinite(estimates[l]))
            {
                throw new ArgumentException($"estimate {l + 1} is not a finite number", nameof(estimates));
            }
            if (!(variances[l] >= 0 && double.IsFinite(variances[l])))
            {
                throw new ArgumentException($"variance {l + 1} must be a finite number of at least 0", nameof(variances));
            }
        }
        if (completeDataDegreesOfFreedom is { } com && !(com > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(completeDataDegreesOfFreedom), com, "the complete-data degrees of freedom must be positive");
        }

        var estimate = estimates.Average();
        var within = variances.Average();
        var between = estimates.Sum(q => (q - estimate) * (q - estimate)) / (m - 1);
        var inflation = 1 + 1.0 / m;
        var total = within + inflation * between;
        if (!(total > 0))
        {
            return PooledEstimate.NotEstimable(m, "the total variance is 0: every completed-data variance is 0 and the imputations agree");
        }
        var lambda = inflation * between / total;
        var r = within > 0 ? inflation * between / within : double.PositiveInfinity;
        // With B = 0 the imputations agree and nu_old is infinite; Barnard-Rubin's nu then tends to nu_obs.
        var rubinDf = lambda > 0 ? (m - 1) / (lambda * lambda) : double.PositiveInfinity;
        double? barnardRubinDf = null;
        if (completeDataDegreesOfFreedom is { } nuCom)
        {
            var observed = (nuCom + 1) / (nuCom + 3) * nuCom * (1 - lambda);
            barnardRubinDf = double.IsPositiveInfinity(rubinDf) ? observed : rubinDf * observed / (rubinDf + observed);
        }
        var df = barnardRubinDf ?? rubinDf;
        if (!(df > 0))
        {
            return PooledEstimate.NotEstimable(m, "the within-imputation variance is 0, so the degrees of freedom are 0: the completed-data analyses carry no information of their own");
        }
        var fmi = double.IsPositiveInfinity(r) ? 1 : (r + 2 / (df + 3)) / (r + 1);
        var se = Math.Sqrt(total);
        var statistic = estimate / se;
        var quantile = double.IsPositiveInfinity(df) ? ConfidenceLevel.NormalQuantile(level) : StudentT.InvCDF(0, 1, df, 1 - (1 - level) / 2);
        var tail = double.IsPositiveInfinity(df) ? Normal.CDF(0, 1, -Math.Abs(statistic)) : StudentT.CDF(0, 1, df, -Math.Abs(statistic));
        var notes = between == 0
            ? new[] { "the completed-data estimates are identical (no between-imputation variance): the pooled result is the complete-data one" }
            : [];
        return new PooledEstimate(m, estimate, within, between, total, r, lambda, fmi, rubinDf, barnardRubinDf, statistic,
            Math.Min(1, 2 * tail), estimate - quantile * se, estimate + quantile * se)
        { Notes = notes };
    }
}
