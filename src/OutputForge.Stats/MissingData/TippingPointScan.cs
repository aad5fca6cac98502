namespace OutputForge.Stats.MissingData;

/// <summary>
/// A tipping-point (delta-adjusted) sensitivity analysis (Ratitch, O'Kelly and Tosiello 2013, Pharmaceutical
/// Statistics 12:337-347; National Research Council 2010, The Prevention and Treatment of Missing Data in Clinical
/// Trials, chapter 5): the analysis is rerun with the imputed values shifted by each delta of a grid, ordered from the
/// mildest to the most severe departure from the primary assumption, and the tipping point is the first shift at which
/// the conclusion (p-value at most alpha or not) differs from the one at the first shift. The analysis itself is the
/// caller's (a function from the shift to the estimate and its p-value).
/// </summary>
public static class TippingPointScan
{
    public static TippingPointResult Scan(IReadOnlyList<double> shifts, Func<double, (double Estimate, double PValue)> analysis, double alpha)
    {
        ArgumentNullException.ThrowIfNull(shifts);
        ArgumentNullException.ThrowIfNull(analysis);
        if (!(alpha > 0 && alpha < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "alpha must lie strictly between 0 and 1");
        }
        if (shifts.Count == 0)
        {
            throw new ArgumentException("the grid of shifts is empty", nameof(shifts));
        }
        var increasing = shifts.Zip(shifts.Skip(1)).All(p => p.Second > p.First);
        var decreasing = shifts.Zip(shifts.Skip(1)).All(p => p.Second < p.First);
        if (shifts.Any(s => !double.IsFinite(s)) || !(increasing || decreasing))
        {
            throw new ArgumentException("the shifts must be finite numbers in strictly increasing or strictly decreasing order, mildest first", nameof(shifts));
        }
        var rows = new List<TippingPointRow>();
        foreach (var shift in shifts)
        {
            var (estimate, p) = analysis(shift);
            if (!double.IsFinite(estimate) || !(p >= 0 && p <= 1))
            {
                throw new ArgumentException(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"the analysis at shift {shift} gave estimate {estimate} and p-value {p}; expected a finite estimate and a p-value in [0, 1]"), nameof(analysis));
            }
            rows.Add(new TippingPointRow(shift, estimate, p, p <= alpha));
        }
        var first = rows[0].Significant;
        var tip = rows.FindIndex(r => r.Significant != first);
        var returns = tip >= 0 && rows.Skip(tip).Any(r => r.Significant == first);
        return new TippingPointResult(rows, first, tip >= 0 ? rows[tip].Shift : null, tip > 0 ? rows[tip - 1].Shift : null)
        {
            Notes = returns
                ? ["the conclusion changes back at a more severe shift: the results are not monotone in the shift, the tipping point is the first change"]
                : [],
        };
    }
}
