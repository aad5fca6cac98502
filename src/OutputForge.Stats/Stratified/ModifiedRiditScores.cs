using OutputForge.Stats.Contingency;

namespace OutputForge.Stats.Stratified;

/// <summary>
/// Modified ridit (standardized midrank) column scores of one table: a_j = (2 C_j - n_j + 1) / (2 (N + 1)),
/// with n_j the column total, C_j the cumulative total up to and including column j and N the table total,
/// i.e. the column's midrank divided by N + 1: ridits (Bross 1958, Biometrics 14:18-38) standardized for
/// the CMH mean score statistics of Landis, Heyman and Koch (1978, Int Stat Rev 46:237-254), recalled from
/// memory; the same as the "midrank" scores of the R package vcdExtra's CMHtest, which the tests check
/// against. An empty column gets the score of the
/// boundary between its neighbours.
/// </summary>
public static class ModifiedRiditScores
{
    public static IReadOnlyList<double> Of(int[,] table)
    {
        ArgumentNullException.ThrowIfNull(table);
        var totals = TableMargins.ColumnTotals(table).ToArray();
        double n = totals.Sum();
        var scores = new double[totals.Length];
        double cumulative = 0;
        for (var j = 0; j < totals.Length; j++)
        {
            cumulative += totals[j];
            scores[j] = (2 * cumulative - totals[j] + 1) / (2 * (n + 1));
        }
        return scores;
    }
}
