namespace OutputForge.Stats;

/// <summary>
/// Sample quantile definitions, numbered as in Hyndman and Fan (1996), "Sample quantiles in
/// statistical packages", The American Statistician 50:361-365.
/// </summary>
public enum QuantileMethod
{
    /// <summary>
    /// Type 2: inverse of the empirical distribution function, averaging at discontinuities
    /// (the definition SAS uses by default, PCTLDEF=5).
    /// </summary>
    HyndmanFan2,

    /// <summary>Type 7: linear interpolation between order statistics at (n - 1)p + 1 (R's and numpy's default).</summary>
    HyndmanFan7,
}
