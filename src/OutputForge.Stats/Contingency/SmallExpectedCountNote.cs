using System.Globalization;

namespace OutputForge.Stats.Contingency;

/// <summary>
/// The warning a chi-square result carries when some expected counts are below 5 (Cochran 1954:
/// the approximation is doubtful when any expected count is below 1 or more than 20% are below 5).
/// </summary>
internal static class SmallExpectedCountNote
{
    public static string? For(int[,] table)
    {
        var diagnostics = ContingencyTable.Diagnose(table);
        if (diagnostics.CellsBelowFive == 0)
        {
            return null;
        }
        return string.Create(CultureInfo.InvariantCulture,
            $"{diagnostics.CellsBelowFive} of {diagnostics.CellCount} cells ({100.0 * diagnostics.ShareBelowFive:0}%) have expected counts below 5 (smallest {diagnostics.MinimumExpected:0.00}); the chi-square approximation may be poor.");
    }
}
