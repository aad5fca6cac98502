namespace OutputForge.Results;

/// <summary>How a number is to be displayed; the Layout stage owns the actual rounding rules.</summary>
public enum ValueFormat
{
    /// <summary>A whole number of subjects or events.</summary>
    Count,
    /// <summary>A percentage, with the table's percent decimals.</summary>
    Percent,
    /// <summary>An estimate or bound with a fixed number of decimals.</summary>
    Decimal,
    /// <summary>A p-value, with the table's threshold ("&lt;0.001").</summary>
    PValue,
}
