namespace OutputForge.Stats.Contingency;

/// <summary>
/// Expected cell counts of an r x c table under independence (row total x column total / n), as
/// used by the automatic choice between chi-square and Fisher's exact test.
/// </summary>
/// <param name="MinimumExpected">The smallest expected count.</param>
/// <param name="CellsBelowFive">Number of cells with an expected count below 5.</param>
/// <param name="CellCount">Number of cells.</param>
public sealed record ExpectedCountDiagnostics(double MinimumExpected, int CellsBelowFive, int CellCount)
{
    public double ShareBelowFive => CellCount == 0 ? 0 : (double)CellsBelowFive / CellCount;
}
