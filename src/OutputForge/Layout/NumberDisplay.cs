namespace OutputForge.Layout;

/// <summary>What a laid-out table shows in place of each number.</summary>
public enum NumberDisplay
{
    /// <summary>The numbers, rounded by the display rules (a table).</summary>
    Values,

    /// <summary>
    /// Placeholders of the numbers' precision, "x" for counts, "xx.x" for percentages, "0.xxx" for
    /// p-values, "(N=xx)" in headers (a mock shell for the statistical analysis plan).
    /// </summary>
    Placeholders,
}
