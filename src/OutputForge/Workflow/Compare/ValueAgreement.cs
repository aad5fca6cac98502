using System.Globalization;
using OutputForge.Layout;
using OutputForge.Results;

namespace OutputForge.Workflow.Compare;

/// <summary>Decides whether one QC value agrees with one production number, and says why not.</summary>
public static class ValueAgreement
{
    /// <summary>Null when the values agree; otherwise the reason they do not.</summary>
    public static string? Disagreement(RunRecord production, string qcText, CompareTolerance tolerance)
    {
        var qcNotEstimable = qcText.Length == 0 || qcText.Equals(CellText.NotEstimable, StringComparison.OrdinalIgnoreCase);
        if (production.Value is not { } value)
        {
            return qcNotEstimable ? null : "production is not estimable (NE), QC has a value";
        }
        if (qcNotEstimable)
        {
            return "QC is not estimable (NE or empty), production has a value";
        }
        if (!double.TryParse(qcText, NumberStyles.Float, CultureInfo.InvariantCulture, out var qc) || !double.IsFinite(qc))
        {
            return $"QC value '{qcText}' is not a number";
        }
        if (production.Statistic is StatisticNames.SubjectCount or StatisticNames.Denominator)
        {
            return qc == value ? null : "counts differ (counts must agree exactly)";
        }
        if (tolerance.Absolute is { } limit)
        {
            var difference = Math.Abs(qc - value);
            // A relative slack far below any displayed precision keeps binary noise ("0.1 vs 0.1000000000000001") from failing a tolerance of 0.
            return difference <= limit + 1e-12 * Math.Max(1, Math.Abs(value))
                ? null
                : string.Create(CultureInfo.InvariantCulture, $"differs by {difference:G6} (tolerance {limit:R})");
        }
        var shown = ShownAs(qc, production.Formatted);
        return shown == production.Formatted ? null : $"QC value displays as {shown}, production as {production.Formatted}";
    }

    /// <summary>
    /// The QC value displayed the way the production text is: "&lt;0.001" / "&gt;0.999" thresholds
    /// kept, otherwise rounded half away from zero to the production text's decimals (NumberText).
    /// </summary>
    public static string ShownAs(double qc, string productionText)
    {
        if (productionText.Length > 1 && productionText[0] is '<' or '>' &&
            double.TryParse(productionText[1..], NumberStyles.Float, CultureInfo.InvariantCulture, out var threshold))
        {
            var decimalsOfThreshold = Decimals(productionText[1..]);
            if (productionText[0] == '<' && qc < threshold)
            {
                return productionText;
            }
            if (productionText[0] == '>' && qc > threshold)
            {
                return productionText;
            }
            return NumberText.Fixed(qc, decimalsOfThreshold);
        }
        return NumberText.Fixed(qc, Decimals(productionText));
    }

    private static int Decimals(string text)
    {
        var dot = text.IndexOf('.');
        return dot < 0 ? 0 : text.Length - dot - 1;
    }
}
