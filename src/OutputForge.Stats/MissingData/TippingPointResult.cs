namespace OutputForge.Stats.MissingData;

/// <summary>One shift of a tipping-point scan: the shift, the estimate and p-value of the analysis at it, and whether p &lt;= alpha.</summary>
public sealed record TippingPointRow(double Shift, double Estimate, double PValue, bool Significant);

/// <summary>
/// The rows of a tipping-point scan, the conclusion at the first (mildest) shift, the tipping point (the first shift
/// whose conclusion differs; null when none of the grid does) and the last shift before it, which keeps the first
/// conclusion: the tipping point lies between the two.
/// </summary>
public sealed record TippingPointResult(IReadOnlyList<TippingPointRow> Rows, bool SignificantAtFirstShift, double? TippingShift, double? LastShiftKeepingConclusion)
{
    /// <summary>Remarks a reader must see, such as a conclusion that changes back further along the grid.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
